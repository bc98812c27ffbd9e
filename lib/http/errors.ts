/** Typed application errors, mapped to HTTP status in one table. */
export const ERROR_STATUS = {
  invalid_input: 400,
  unauthenticated: 401,
  invalid_credentials: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  gone: 410,
  payload_too_large: 413,
  unsupported_media_type: 415,
  unavailable: 503,
  internal: 500,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;

export interface FieldError {
  /** Dotted path of the bad field, e.g. "layout.seats.3.clo". */
  path: string;
  message: string;
}

export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fields?: readonly FieldError[],
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
    this.name = "AppError";
  }

  get status(): number {
    return ERROR_STATUS[this.code];
  }
}

export const notFound = (what = "Not found") => new AppError("not_found", what);
export const forbidden = () => new AppError("forbidden", "Your role does not allow this.");
export const unauthenticated = () => new AppError("unauthenticated", "Sign in first.");
