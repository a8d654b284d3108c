import type { RequestHandler } from 'express';
import { pinoHttp } from 'pino-http';
import type { Logger } from '../logger';

/** A request slower than this is logged as a warning when only warnings and errors are logged. */
export const SLOW_REQUEST_MS = 1000;

/**
 * Request logging. At info or debug: one line per request through pino-http (errors and 5xx as errors, 4xx as
 * info), not for the health ping. At warn and above pino-http would still build a child logger and serialize
 * every request only to drop the line, so a lighter hook writes just the failed (5xx) and slow requests, by
 * method and path (no query string, headers or body).
 */
export function requestLogger(logger: Logger, slowMs = SLOW_REQUEST_MS): RequestHandler {
  if (logger.isLevelEnabled('info'))
    return pinoHttp({
      logger,
      autoLogging: { ignore: (req) => req.url === '/api/health/ping' },
      customLogLevel: (_req, res, err) =>
        err || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'info' : 'debug',
    });
  return (req, res, next) => {
    const started = performance.now();
    res.once('finish', () => {
      const responseTimeMs = Math.round(performance.now() - started);
      const status = res.statusCode;
      if (status < 500 && responseTimeMs < slowMs) return;
      const line = {
        req: { method: req.method, path: req.originalUrl.split('?')[0] },
        res: { statusCode: status },
        responseTimeMs,
      };
      if (status >= 500) logger.error(line, 'request failed');
      else logger.warn(line, 'slow request');
    });
    next();
  };
}
