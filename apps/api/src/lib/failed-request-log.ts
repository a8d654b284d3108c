import type { RequestHandler } from 'express';
import type { Logger } from 'pino';

/**
 * Logs each request answered with a 5xx (method, path, status, time taken) at error level, and nothing else:
 * the per-request log for LOG_LEVEL=warn and above, where pino-http's work for every request would be dropped.
 */
export function failedRequestLog(logger: Logger): RequestHandler {
  return (req, res, next) => {
    const started = process.hrtime.bigint();
    res.once('finish', () => {
      if (res.statusCode < 500) return;
      logger.error(
        {
          req: { method: req.method, url: req.originalUrl.split('?')[0] },
          res: { statusCode: res.statusCode },
          responseTime: Number(process.hrtime.bigint() - started) / 1e6,
        },
        'request failed',
      );
    });
    next();
  };
}
