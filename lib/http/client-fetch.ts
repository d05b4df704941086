// Browser-side JSON calls to our route handlers, with errors in the shape every handler returns.

export type ApiIssue = { path: string; message: string };
export type ApiError = { status: number; error: string; message: string; issues?: ApiIssue[] };
export type ApiResult<T> = { ok: true; data: T } | { ok: false; error: ApiError };

/** Sends JSON and reads JSON; network failures come back as status 0 with a plain message. */
export async function apiJson<T>(url: string, init: { method?: string; body?: unknown; onUploadProgress?: (fraction: number) => void } = {}): Promise<ApiResult<T>> {
  const body = init.body === undefined ? undefined : JSON.stringify(init.body);
  if (init.onUploadProgress && body !== undefined) return xhrJson<T>(url, init.method ?? "POST", body, init.onUploadProgress);
  try {
    const res = await fetch(url, { method: init.method ?? (body ? "POST" : "GET"), headers: body ? { "content-type": "application/json" } : undefined, body, credentials: "same-origin" });
    return readResult<T>(res.status, await res.text());
  } catch {
    return { ok: false, error: { status: 0, error: "network", message: "Roostline could not be reached. Check your connection and try again." } };
  }
}

function readResult<T>(status: number, text: string): ApiResult<T> {
  let parsed: unknown = null;
  try {
    parsed = text ? JSON.parse(text) : null;
  } catch {
    // A non-JSON body (a proxy's error page, say) is reported by status below.
  }
  if (status >= 200 && status < 300) return { ok: true, data: parsed as T };
  const e = (parsed ?? {}) as Partial<ApiError>;
  return { ok: false, error: { status, error: e.error ?? "error", message: e.message ?? `The request failed (HTTP ${status}).`, issues: e.issues } };
}

// fetch() reports no upload progress; XMLHttpRequest does.
function xhrJson<T>(url: string, method: string, body: string, onProgress: (fraction: number) => void): Promise<ApiResult<T>> {
  return new Promise((resolve) => {
    const xhr = new XMLHttpRequest();
    xhr.open(method, url);
    xhr.setRequestHeader("content-type", "application/json");
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(e.loaded / e.total);
    xhr.onload = () => {
      onProgress(1);
      resolve(readResult<T>(xhr.status, xhr.responseText));
    };
    xhr.onerror = () => resolve({ ok: false, error: { status: 0, error: "network", message: "Roostline could not be reached. Check your connection and try again." } });
    xhr.send(body);
  });
}
