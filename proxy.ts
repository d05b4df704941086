import { getSessionCookie } from "better-auth/cookies";
import { type NextRequest, NextResponse } from "next/server";

// An optimistic redirect only: the guard in every page, action and handler is the real check.
export function proxy(request: NextRequest) {
  if (!getSessionCookie(request)) {
    const url = new URL("/sign-in", request.url);
    const next = request.nextUrl.pathname + request.nextUrl.search;
    if (next !== "/") url.searchParams.set("next", next);
    return NextResponse.redirect(url);
  }
  return NextResponse.next();
}

export const config = {
  // Everything but sign-in pages, the APIs (which answer 401 themselves) and static files.
  matcher: ["/((?!api/|_next/|sign-in|set-password|forgot-password|icon.svg|favicon.ico|robots.txt).*)"],
};
