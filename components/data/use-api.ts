import { useCallback, useEffect, useRef, useState } from "react";

/** A failed request, with the message a person should read. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;

  constructor(status: number, code: string, message: string) {
    super(message);
    this.name = "ApiError";
    this.status = status;
    this.code = code;
  }
}

/** The message to show for a failed response; the server's own message wins when it sent one. */
export function apiErrorFor(status: number, body: unknown): ApiError {
  const b = (typeof body === "object" && body !== null ? body : {}) as { error?: unknown; message?: unknown };
  const code = typeof b.error === "string" ? b.error : `http_${status}`;
  const sent = typeof b.message === "string" && b.message.trim() !== "" ? b.message : null;
  if (status === 401) return new ApiError(status, code, "Your session has ended. Sign in again to see this list.");
  if (status === 403) return new ApiError(status, code, sent ?? "Your role does not include this list.");
  if (sent) return new ApiError(status, code, sent);
  if (status === 429 || status === 503) return new ApiError(status, code, "The server is busy. Try again in a moment.");
  return new ApiError(status, code, `The server answered with status ${status}.`);
}

export type ApiState<T> = {
  /** The newest successful answer; kept while a refetch or a new URL loads, so the table does not blank. */
  data: T | undefined;
  /** The newest failure, cleared by the next success. */
  error: ApiError | undefined;
  /** A request is in flight (first load or refetch). */
  loading: boolean;
  /** Loads again, e.g. from a Retry button. */
  refetch: () => void;
};

type Settled<T> = { key: string; data: T | undefined; error: ApiError | undefined };

/**
 * Fetches a route handler's JSON and validates it with `parse` (a zod schema's parse, usually), so a
 * changed server shape shows as an error instead of a broken table. `url: null` waits without fetching.
 * The request is aborted when the component unmounts or the URL changes before it answers.
 */
export function useApi<T>(url: string | null, parse: (json: unknown) => T): ApiState<T> {
  const [attempt, setAttempt] = useState(0);
  const [settled, setSettled] = useState<Settled<T>>({ key: "", data: undefined, error: undefined });
  const parseRef = useRef(parse);
  const key = url === null ? "" : `${attempt} ${url}`;

  useEffect(() => {
    parseRef.current = parse;
  });

  useEffect(() => {
    if (url === null) return;
    const controller = new AbortController();
    const settle = (next: { data?: T; error?: ApiError }) =>
      setSettled((prev) => ({ key, data: next.error ? prev.data : next.data, error: next.error }));
    (async () => {
      let response: Response;
      try {
        response = await fetch(url, { signal: controller.signal, headers: { accept: "application/json" }, credentials: "same-origin", cache: "no-store" });
      } catch {
        if (!controller.signal.aborted) settle({ error: new ApiError(0, "network", "Could not reach the server. Check the connection and try again.") });
        return;
      }
      let body: unknown = null;
      try {
        body = await response.json();
      } catch {
        if (controller.signal.aborted) return;
        if (response.ok) return settle({ error: new ApiError(response.status, "unreadable", "The server's answer could not be read.") });
      }
      if (controller.signal.aborted) return;
      if (!response.ok) return settle({ error: apiErrorFor(response.status, body) });
      try {
        settle({ data: parseRef.current(body) });
      } catch {
        settle({ error: new ApiError(response.status, "unexpected_shape", "The server's answer was not in the expected shape. Reload the page; if it persists, tell an administrator.") });
      }
    })();
    return () => controller.abort();
  }, [url, key]);

  const refetch = useCallback(() => setAttempt((n) => n + 1), []);
  return { data: settled.data, error: settled.error, loading: key !== "" && settled.key !== key, refetch };
}
