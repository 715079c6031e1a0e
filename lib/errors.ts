/**
 * One error type for every expected failure. The code decides the HTTP status; the message is written for
 * the person using Fadeline and is safe to show. Anything else that is thrown is logged and answered with a
 * generic 500, so no database or stack detail reaches a client.
 */
export type ErrorCode =
  | "bad_request"
  | "invalid_input"
  | "unauthenticated"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "gone"
  | "payload_too_large"
  | "unsupported_media_type"
  | "rate_limited"
  | "unavailable"
  | "internal";

const STATUS: Record<ErrorCode, number> = {
  bad_request: 400,
  invalid_input: 422,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  gone: 410,
  payload_too_large: 413,
  unsupported_media_type: 415,
  rate_limited: 429,
  unavailable: 503,
  internal: 500,
};

/** Field name → messages, as react-hook-form shows them beside each input. */
export type FieldErrors = Record<string, string[]>;

export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fields?: FieldErrors,
  ) {
    super(message);
    this.name = "AppError";
  }

  get status(): number {
    return STATUS[this.code];
  }

  toJSON(): { error: { code: ErrorCode; message: string; fields?: FieldErrors } } {
    return { error: { code: this.code, message: this.message, ...(this.fields ? { fields: this.fields } : {}) } };
  }
}

export const notFound = (what = "That record") => new AppError("not_found", `${what} was not found.`);
export const forbidden = (message = "Your role in this organisation does not allow that.") =>
  new AppError("forbidden", message);
export const unauthenticated = () => new AppError("unauthenticated", "Sign in to continue.");
