export type FieldErrors = Record<string, string[]>;

export type ErrorCode =
  | "unauthenticated"
  | "forbidden"
  | "not_found"
  | "invalid"
  | "conflict"
  | "stale"
  /** The change goes past a physio restriction and came without a reason to override it. */
  | "restricted"
  /** The change goes past a plausibility limit (lib/plan/plausibility.ts) and came without `confirmed: true`. */
  | "implausible"
  /** The request body is over the size limit (lib/http.ts). */
  | "too_large"
  | "internal";

const STATUS: Record<ErrorCode, number> = {
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  invalid: 400,
  conflict: 409,
  stale: 409,
  restricted: 409,
  implausible: 422,
  too_large: 413,
  internal: 500,
};

/** The one error type the app throws on purpose; route handlers turn it into JSON with its status. */
export class AppError extends Error {
  readonly code: ErrorCode;
  readonly status: number;
  readonly fields?: FieldErrors;
  readonly details?: Record<string, unknown>;

  constructor(
    code: ErrorCode,
    message: string,
    opts: { fields?: FieldErrors; details?: Record<string, unknown> } = {},
  ) {
    super(message);
    this.name = "AppError";
    this.code = code;
    this.status = STATUS[code];
    this.fields = opts.fields;
    this.details = opts.details;
  }
}
