// Signed device configurations: the server signs the canonical JSON of a payload with Ed25519
// (RFC 8032) and controllers verify it with the published public key. Server only: node:crypto.
import { createPrivateKey, createPublicKey, sign, verify, type KeyObject } from "node:crypto";
import { canonicalJson } from "@/lib/profiles/canonical";

/** A key as PEM text, as base64 DER (PKCS#8 for private, SPKI for public keys; the environment's form) or a KeyObject. */
export type KeyInput = string | KeyObject;

/** The Ed25519 private key object for a key in any accepted form (parse once, sign many times). */
export function privateKeyOf(key: KeyInput): KeyObject {
  const k = typeof key !== "string" ? key : key.includes("-----BEGIN") ? createPrivateKey(key) : createPrivateKey({ key: Buffer.from(key, "base64"), format: "der", type: "pkcs8" });
  if (k.type !== "private" || k.asymmetricKeyType !== "ed25519") throw new TypeError(`the signing key must be an Ed25519 private key, got ${k.asymmetricKeyType ?? "unknown"} ${k.type}`);
  return k;
}

function publicKeyOf(key: KeyInput): KeyObject {
  const k = typeof key !== "string" ? key : key.includes("-----BEGIN") ? createPublicKey(key) : createPublicKey({ key: Buffer.from(key, "base64"), format: "der", type: "spki" });
  // A private key also verifies: node derives its public half.
  const pub = k.type === "private" ? createPublicKey(k) : k;
  if (pub.asymmetricKeyType !== "ed25519") throw new TypeError(`the verifying key must be an Ed25519 key, got ${pub.asymmetricKeyType ?? "unknown"}`);
  return pub;
}

/** The bytes that are signed: canonical JSON (keys sorted, no whitespace), the same for every signer and verifier. */
export function canonicalPayload(payload: unknown): string {
  return canonicalJson(payload);
}

/** Ed25519 signature (base64) over the UTF-8 bytes of a canonical payload. */
export function signPayload(canonical: string, privateKey: KeyInput): string {
  // Ed25519 hashes internally, so node takes no digest name (null).
  return sign(null, Buffer.from(canonical, "utf8"), privateKeyOf(privateKey)).toString("base64");
}

const BASE64 = /^[A-Za-z0-9+/]{86}==$/;

/** Whether a base64 Ed25519 signature is valid for the canonical payload; false for any malformed signature. */
export function verifyPayload(canonical: string, signatureB64: string, publicKey: KeyInput): boolean {
  // An Ed25519 signature is 64 bytes, 88 base64 characters; Buffer.from would skip stray characters.
  if (!BASE64.test(signatureB64)) return false;
  return verify(null, Buffer.from(canonical, "utf8"), publicKeyOf(publicKey), Buffer.from(signatureB64, "base64"));
}

// entity-tag = [ weak ] opaque-tag; opaque-tag = DQUOTE *etagc DQUOTE; etagc = %x21 / %x23-7E / obs-text
// (RFC 9110, HTTP Semantics, section 8.8.3). Only visible ASCII is allowed here.
const ETAGC = /^[\x21\x23-\x7e]+$/;

/** A strong ETag (quoted, no W/ prefix) for a content hash. */
export function strongEtag(contentHash: string): string {
  if (!ETAGC.test(contentHash)) throw new TypeError("an entity tag holds visible ASCII characters other than the double quote, and at least one");
  return `"${contentHash}"`;
}
