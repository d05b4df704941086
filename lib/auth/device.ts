import { timingSafeEqual } from "node:crypto";
import { hashToken } from "@/db/queries/controllers";
import { type DeviceController, findControllerByTokenHash } from "@/db/queries/device-lookup";
import { getEnv } from "@/lib/env";
import { AppError } from "@/lib/http/errors";

const WINDOW_MS = 60_000;
const hits = new Map<number, { windowStart: number; count: number }>();

// A fixed-window counter per controller in this process. Controllers poll every few minutes for
// years, so the limit only stops a runaway device; it is set from the environment, never a library default.
function checkRate(controllerId: number, now: number) {
  const limit = getEnv().DEVICE_RATE_LIMIT_PER_MINUTE;
  const h = hits.get(controllerId);
  if (!h || now - h.windowStart >= WINDOW_MS) {
    hits.set(controllerId, { windowStart: now, count: 1 });
    return;
  }
  h.count++;
  if (h.count > limit) {
    throw new AppError("rate_limited", `Too many requests from this controller; at most ${limit} a minute.`, { retryAfterSeconds: Math.ceil((h.windowStart + WINDOW_MS - now) / 1000) });
  }
}

/** The calling controller from its bearer token: 401 for a missing, wrong or revoked token; 429 when it polls too fast. */
export async function requireController(request: Request): Promise<DeviceController> {
  const header = request.headers.get("authorization") ?? "";
  const match = /^Bearer ([A-Za-z0-9_-]{10,200})$/.exec(header);
  if (!match) throw new AppError("unauthenticated", "Send the controller's token as Authorization: Bearer <token>.");
  const hash = hashToken(match[1]!);
  const controller = await findControllerByTokenHash({ tokenHash: hash });
  // The lookup is by hash; the constant-time compare guards against a collation quirk matching a near miss.
  if (!controller || !timingSafeEqual(Buffer.from(controller.tokenHash, "hex"), Buffer.from(hash, "hex"))) {
    throw new AppError("unauthenticated", "This token is not valid or has been revoked.");
  }
  checkRate(controller.id, Date.now());
  return controller;
}

/** 403 unless the URL's serial is the calling controller's own. */
export function requireOwnSerial(controller: DeviceController, serial: string) {
  if (controller.serial !== serial) throw new AppError("forbidden", "A controller may only use its own serial.");
}
