// One error type for everything a client may be told; anything else becomes a masked 500.

export type ErrorCode =
  | "invalid_request"
  | "invalid_profile"
  | "unauthenticated"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "rate_limited"
  | "unavailable";

const STATUS: Record<ErrorCode, number> = {
  invalid_request: 400,
  invalid_profile: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  rate_limited: 429,
  unavailable: 503,
};

export type Issue = { path: string; message: string };

export class AppError extends Error {
  readonly code: ErrorCode;
  readonly status: number;
  readonly issues?: Issue[];
  readonly retryAfterSeconds?: number;

  constructor(code: ErrorCode, message: string, opts: { issues?: Issue[]; retryAfterSeconds?: number } = {}) {
    super(message);
    this.name = "AppError";
    this.code = code;
    this.status = STATUS[code];
    this.issues = opts.issues;
    this.retryAfterSeconds = opts.retryAfterSeconds;
  }
}

const CONNECTION_CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "ETIMEDOUT",
  "PROTOCOL_CONNECTION_LOST",
  "ER_CON_COUNT_ERROR",
  "POOL_CLOSED",
]);

/** Whether an error (or its cause, as Drizzle wraps driver errors) means the database is unreachable. */
export function isDatabaseUnavailable(err: unknown): boolean {
  for (let e: unknown = err, depth = 0; e && depth < 5; depth++) {
    const code = (e as { code?: unknown }).code;
    if (typeof code === "string" && CONNECTION_CODES.has(code)) return true;
    e = (e as { cause?: unknown }).cause;
  }
  return false;
}

const CONTENTION_CODES = new Set(["ER_LOCK_DEADLOCK", "ER_LOCK_WAIT_TIMEOUT"]);

/** Whether an error (or its cause) is the database giving up on a transaction that met another. */
export function isContention(err: unknown): boolean {
  for (let e: unknown = err, depth = 0; e && depth < 5; depth++) {
    const code = (e as { code?: unknown }).code;
    if (typeof code === "string" && CONTENTION_CODES.has(code)) return true;
    e = (e as { cause?: unknown }).cause;
  }
  return false;
}

/** Turns any thrown value into a known AppError, or undefined when it must be logged and masked. */
export function toAppError(err: unknown): AppError | undefined {
  if (err instanceof AppError) return err;
  if (isDatabaseUnavailable(err)) {
    return new AppError("unavailable", "The database is not reachable right now; try again shortly.", {
      retryAfterSeconds: 5,
    });
  }
  if (isContention(err)) {
    // The transaction was rolled back whole; nothing was written.
    return new AppError("conflict", "Someone else changed this at the same moment; nothing was saved. Try again.", { retryAfterSeconds: 1 });
  }
  return undefined;
}
