import type { RequestHandler } from 'express';
import { z } from 'zod';

/** Faults a test can switch on through `POST /__fake/faults`; all off by default. */
export interface Faults {
  /**
   * Refunds are made and their events sent as usual, but the API answer to `POST /v1/refunds` leaves only after
   * this many milliseconds: the caller's request times out although the money went back.
   */
  refundAnswerDelayMs: number;
}

export const faultsSchema = z
  .object({ refundAnswerDelayMs: z.number().int().min(0).max(120_000) })
  .partial()
  .strict();

export const noFaults = (): Faults => ({ refundAnswerDelayMs: 0 });

/** Holds back the answer (not the work) of the routes it guards by `delayMs()`. */
export const delayAnswer =
  (delayMs: () => number): RequestHandler =>
  (_req, res, next) => {
    const ms = delayMs();
    if (ms > 0) {
      const end = res.end.bind(res) as (...args: unknown[]) => typeof res;
      res.end = ((...args: unknown[]) => {
        setTimeout(() => {
          if (!res.socket?.destroyed) end(...args);
        }, ms).unref();
        return res;
      }) as typeof res.end;
    }
    next();
  };
