import type { ErrorCode, ErrorDetail } from '@sheaf/engine/api';

/**
 * An error the API answers with: an HTTP status, a code from the contract, and a message that
 * tells the caller what to fix (naming the field where there is one). Thrown by handlers and
 * middleware; turned into `{ error: { code, message } }` by the one error middleware.
 */
export class ApiError extends Error {
  override name = 'ApiError';

  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    options?: ErrorOptions & { details?: ErrorDetail[] },
  ) {
    super(message, options);
    this.details = options?.details;
  }

  /** Each problem, when the request has several (the bad rows of an uploaded file). */
  readonly details: ErrorDetail[] | undefined;
}

export function invalidField(field: string, problem: string): ApiError {
  return new ApiError(400, 'invalid-field', `${field}: ${problem}`);
}

export function notSignedIn(message = 'sign in first'): ApiError {
  return new ApiError(401, 'not-signed-in', message);
}

export function forbidden(message: string): ApiError {
  return new ApiError(403, 'forbidden', message);
}

/** The same answer whether the thing does not exist or belongs to an organization the caller is not in. */
export function notFound(what: string): ApiError {
  return new ApiError(404, 'not-found', `${what} not found`);
}

export function conflict(message: string): ApiError {
  return new ApiError(409, 'conflict', message);
}
