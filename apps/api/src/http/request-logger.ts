import { pinoHttp } from 'pino-http';
import type { Logger } from '../logger';

/** One log line per request (errors and 5xx as errors, 4xx as info), not for the health ping. */
export const requestLogger = (logger: Logger) =>
  pinoHttp({
    logger,
    autoLogging: { ignore: (req) => req.url === '/api/health/ping' },
    customLogLevel: (_req, res, err) =>
      err || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'info' : 'debug',
  });
