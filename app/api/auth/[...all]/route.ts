import { toNextJsHandler } from "better-auth/next-js";
import { getAuth } from "@/lib/auth/auth";
import { errorResponse } from "@/lib/http/route";
import { AppError } from "@/lib/http/errors";

// People are managed through Roostline's own pages and actions (last-admin rule, audit, password
// rules); the auth library's own admin endpoints would skip all of that, so they are not served.
const handler = (request: Request) => {
  if (new URL(request.url).pathname.startsWith("/api/auth/admin/")) {
    return errorResponse(new AppError("not_found", "Manage people on the People page or through /api/v1/users."));
  }
  return toNextJsHandler(getAuth()).POST(request);
};

export { handler as GET, handler as POST };
