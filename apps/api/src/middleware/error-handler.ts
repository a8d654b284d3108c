import type { ErrorRequestHandler, RequestHandler } from 'express';
import multer from 'multer';
import {
  BaseError,
  ConnectionError,
  TimeoutError,
  UniqueConstraintError,
  ValidationError as SequelizeValidationError,
  ConnectionAcquireTimeoutError,
} from 'sequelize';
import { ZodError } from 'zod';
import type { ErrorBody } from '@app/shared';
import { AppError } from '../errors/app-error';
import type { Logger } from '../logger';

/** Flattens zod issues to `{ 'a.b': 'message' }`, first message per path. */
export function zodFields(err: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of err.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_';
    fields[key] ??= issue.message;
  }
  return fields;
}

/** True for errors that mean MariaDB is unreachable, as opposed to a bad query. */
export function isDbDown(err: unknown): boolean {
  if (
    err instanceof ConnectionError ||
    err instanceof ConnectionAcquireTimeoutError ||
    err instanceof TimeoutError
  )
    return true;
  const code =
    (err as { code?: unknown; parent?: { code?: unknown } } | null)?.parent?.code ??
    (err as { code?: unknown } | null)?.code;
  // 1047: a Galera node that is leaving or rejoining the cluster ("WSREP has not yet prepared node"); 1053: the
  // server is shutting down; 1927: the server killed the connection (a node stopping ends its sessions).
  const errno =
    (err as { parent?: { errno?: unknown } } | null)?.parent?.errno ??
    (err as { errno?: unknown } | null)?.errno;
  if (errno === 1047 || errno === 1053 || errno === 1927) return true;
  // This process is shutting down and has closed its pool: another process (or a retry) can serve the request.
  if (err instanceof Error && err.message.includes('connection manager was closed')) return true;
  return (
    typeof code === 'string' &&
    [
      'ECONNREFUSED',
      'ER_GET_CONNECTION_TIMEOUT',
      'ER_SOCKET_UNEXPECTED_CLOSE',
      'ECONNRESET',
      'ER_CONNECTION_ALREADY_CLOSED',
      'EPIPE',
    ].includes(code)
  );
}

function body(
  code: ErrorBody['error']['code'],
  message: string,
  fields?: Record<string, string>,
): ErrorBody {
  return { error: fields ? { code, message, fields } : { code, message } };
}

export const notFoundHandler: RequestHandler = (req, res) => {
  res.status(404).json(body('NOT_FOUND', `No API route for ${req.method} ${req.path}`));
};

/** The one error handler: maps by class, never leaks internals. */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err: unknown, req, res, _next) => {
    if (res.headersSent) return;
    if (err instanceof AppError) {
      res.status(err.status).json(body(err.code, err.message, err.fields));
      return;
    }
    if (err instanceof ZodError) {
      res.status(400).json(body('VALIDATION_FAILED', 'Some fields need attention', zodFields(err)));
      return;
    }
    if (err instanceof UniqueConstraintError) {
      const fields: Record<string, string> = {};
      for (const e of err.errors) if (e.path) fields[e.path] = 'Already taken';
      res.status(409).json(body('CONFLICT', 'That already exists', fields));
      return;
    }
    if (err instanceof SequelizeValidationError) {
      const fields: Record<string, string> = {};
      for (const e of err.errors) if (e.path) fields[e.path] = e.message;
      res.status(400).json(body('VALIDATION_FAILED', 'Some fields need attention', fields));
      return;
    }
    if (isDbDown(err)) {
      logger.warn({ err }, 'database unavailable');
      res
        .status(503)
        .set('Retry-After', '5')
        .json(
          body(
            'DB_UNAVAILABLE',
            'The club database is not reachable right now. Nothing was changed; please try again in a minute.',
          ),
        );
      return;
    }
    if (err instanceof multer.MulterError) {
      const tooBig = err.code === 'LIMIT_FILE_SIZE';
      const field = err.field ?? 'files';
      const message = tooBig
        ? 'A file is larger than the limit'
        : err.code === 'LIMIT_FILE_COUNT' || err.code === 'LIMIT_UNEXPECTED_FILE'
          ? 'Too many files'
          : err.message;
      res
        .status(tooBig ? 413 : 400)
        .json(
          body(tooBig ? 'PAYLOAD_TOO_LARGE' : 'VALIDATION_FAILED', message, { [field]: message }),
        );
      return;
    }
    const status =
      (err as { status?: unknown; statusCode?: unknown } | null)?.status ??
      (err as { statusCode?: unknown } | null)?.statusCode;
    const type = (err as { type?: unknown } | null)?.type;
    if (type === 'entity.too.large') {
      res.status(413).json(body('PAYLOAD_TOO_LARGE', 'The request is too large'));
      return;
    }
    if (type === 'entity.parse.failed') {
      res.status(400).json(body('VALIDATION_FAILED', 'The request body is not valid JSON'));
      return;
    }
    if (typeof status === 'number' && status >= 400 && status < 500) {
      res
        .status(status)
        .json(
          body(
            status === 403 ? 'FORBIDDEN' : 'VALIDATION_FAILED',
            'The request could not be processed',
          ),
        );
      return;
    }
    if (err instanceof BaseError) logger.error({ err, path: req.path }, 'database error');
    else logger.error({ err, path: req.path }, 'unhandled error');
    res.status(500).json(body('INTERNAL', 'Something went wrong on our side. It has been logged.'));
  };
}
