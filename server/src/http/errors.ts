// One error type for the whole server. Services throw AppError with a kind that says what went wrong;
// only the error middleware turns a kind into an HTTP status.
export type ErrorKind =
  | 'invalid' // the request is wrong in a way the client can fix
  | 'unauthenticated' // no valid sign-in
  | 'forbidden' // signed in, but the role lacks the ability
  | 'not_found'
  | 'conflict'
  | 'gone' // existed, but expired or was used up
  | 'too_large'
  | 'rate_limited'
  | 'unavailable';

export class AppError extends Error {
  constructor(
    readonly code: string,
    readonly kind: ErrorKind,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const STATUS_OF_KIND: Record<ErrorKind, number> = {
  invalid: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  gone: 410,
  too_large: 413,
  rate_limited: 429,
  unavailable: 503,
};

export const notFound = (what = 'resource') => new AppError('not_found', 'not_found', `${what} not found`);
