import type { ZodError } from 'zod';

export type ProviderErrorType = 'invalid_request_error' | 'idempotency_error' | 'api_error';

export interface ProviderErrorBody {
  error: { type: ProviderErrorType; message: string; code?: string; param?: string };
}

/** An error answered in the provider's shape: `{ error: { type, message, code?, param? } }`. */
export class ProviderError extends Error {
  constructor(
    readonly status: number,
    readonly type: ProviderErrorType,
    message: string,
    readonly code?: string,
    readonly param?: string,
  ) {
    super(message);
  }

  toBody(): ProviderErrorBody {
    return {
      error: {
        type: this.type,
        message: this.message,
        ...(this.code ? { code: this.code } : {}),
        ...(this.param ? { param: this.param } : {}),
      },
    };
  }
}

/** 400 invalid_request_error, optionally naming the parameter at fault. */
export function invalidRequest(message: string, param?: string, code?: string): ProviderError {
  return new ProviderError(400, 'invalid_request_error', message, code, param);
}

/** 404 resource_missing for an unknown id, worded like the provider. */
export function noSuch(kind: string, id: string, param = 'id'): ProviderError {
  return new ProviderError(
    404,
    'invalid_request_error',
    `No such ${kind}: '${id}'`,
    'resource_missing',
    param,
  );
}

/** Turns the first zod issue into a provider-style error naming the bracketed parameter. */
export function fromZodError(error: ZodError): ProviderError {
  const issue = error.issues[0];
  if (!issue) return invalidRequest('Invalid request');
  const param = issue.path
    .map((part, index) => (index === 0 ? String(part) : `[${String(part)}]`))
    .join('');
  if (issue.code === 'invalid_type' && issue.input === undefined) {
    return invalidRequest(`Missing required param: ${param}.`, param, 'parameter_missing');
  }
  return invalidRequest(`Invalid ${param}: ${issue.message}`, param, 'parameter_invalid');
}
