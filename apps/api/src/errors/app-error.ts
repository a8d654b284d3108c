import { STATUS_BY_CODE, type ErrorCode } from '@app/shared';

/** The one error type services throw; the error handler maps it to its HTTP status. */
export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = 'AppError';
  }
  get status(): number {
    return STATUS_BY_CODE[this.code];
  }
}

export const notFound = (what: string) => new AppError('NOT_FOUND', `${what} not found`);
export const invalid = (fields: Record<string, string>, message = 'Some fields need attention') =>
  new AppError('VALIDATION_FAILED', message, fields);
