import { toNextJsHandler } from "better-auth/next-js";
import { getAuth } from "@/lib/auth/auth";

const handler = (request: Request) => toNextJsHandler(getAuth()).POST(request);

export { handler as GET, handler as POST };
