import { openApiDocument } from "@/lib/api/openapi";
import { handle } from "@/lib/http/route";

/** The OpenAPI 3.1 description of the device API and the fleet endpoints. */
export const GET = handle(async () => Response.json(openApiDocument, { headers: { "cache-control": "public, max-age=300" } }));
