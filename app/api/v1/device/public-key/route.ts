import { createPrivateKey, createPublicKey } from "node:crypto";
import { getEnv } from "@/lib/env";
import { AppError } from "@/lib/http/errors";
import { handle } from "@/lib/http/route";

/** The Ed25519 public key controllers verify configurations with (PEM and raw 32 bytes in base64). */
export const GET = handle(async () => {
  const key = getEnv().DEVICE_SIGNING_KEY;
  if (!key) throw new AppError("unavailable", "Configuration signing is not set up on this server.", { retryAfterSeconds: 300 });
  const publicKey = createPublicKey(createPrivateKey({ key: Buffer.from(key, "base64"), format: "der", type: "pkcs8" }));
  const pem = publicKey.export({ type: "spki", format: "pem" }).toString();
  const raw = (publicKey.export({ format: "jwk" }) as { x: string }).x;
  return Response.json({ algorithm: "Ed25519", pem, raw: Buffer.from(raw, "base64url").toString("base64") }, { headers: { "cache-control": "public, max-age=3600" } });
});
