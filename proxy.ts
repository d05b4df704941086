import { getSessionCookie } from "better-auth/cookies";
import { type NextRequest, NextResponse } from "next/server";

const PUBLIC_PAGES = ["/sign-in", "/set-password", "/forgot-password"];

/**
 * The content security policy of every page: scripts only with this response's nonce (and what they
 * load), styles inline as the editor writes them, workers from our own origin, nothing from elsewhere.
 */
export function contentSecurityPolicy(nonce: string): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self' data:",
    "worker-src 'self' blob:",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

/** Whether a server-action POST comes from another site (its Origin is not the host it was sent to). */
function crossSiteAction(request: NextRequest): boolean {
  if (request.method !== "POST" || !request.headers.has("next-action")) return false;
  const origin = request.headers.get("origin");
  if (!origin) return false;
  const host = request.headers.get("x-forwarded-host") ?? request.headers.get("host");
  try {
    return new URL(origin).host !== host;
  } catch {
    return true;
  }
}

// Sets each page's content security policy, refuses cross-site server actions with a plain 403
// (Next would refuse them too, as a 500), and sends the signed-out to sign-in. The redirect is
// optimistic only: the guard in every page, action and handler is the real check.
export function proxy(request: NextRequest) {
  if (crossSiteAction(request)) {
    return NextResponse.json({ error: "forbidden", message: "Cross-site requests to Roostline's forms are refused." }, { status: 403 });
  }
  const path = request.nextUrl.pathname;
  if (!PUBLIC_PAGES.some((p) => path === p || path.startsWith(`${p}/`)) && !getSessionCookie(request)) {
    const url = new URL("/sign-in", request.url);
    const next = path + request.nextUrl.search;
    if (next !== "/") url.searchParams.set("next", next);
    return NextResponse.redirect(url);
  }
  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const csp = contentSecurityPolicy(nonce);
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set("x-nonce", nonce);
  requestHeaders.set("content-security-policy", csp);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set("content-security-policy", csp);
  return response;
}

export const config = {
  // Every page; not the APIs (JSON, no scripts, they answer 401 themselves) nor static files.
  matcher: ["/((?!api/|_next/static|_next/image|icon.svg|favicon.ico|robots.txt).*)"],
};
