import { createPrivateKey, createPublicKey, generateKeyPairSync } from "node:crypto";
import { describe, expect, it } from "vitest";
import { canonicalPayload, signPayload, strongEtag, verifyPayload } from "@/lib/fleet/signing";

// RFC 8032, "Edwards-Curve Digital Signature Algorithm (EdDSA)", section 7.1, TEST 1 (an empty message).
const RFC8032_TEST1 = {
  secretKey: "9d61b19deffd5a60ba844af492ec2cc44449c5697b326919703bac031cae7f60",
  publicKey: "d75a980182b10ab7d54bfed3c964073a0ee172f3daa62325af021a68f707511a",
  signature: "e5564300c360ac729086e2cc806e828a84877f1eb8e5d974d873e065224901555fb8821590a33bacc61e39701cf9b46bd25bf5f0595bbe24655141438e7a100b",
};

const b64url = (hex: string) => Buffer.from(hex, "hex").toString("base64url");
// The raw 32-byte keys wrapped for node: the private key as a JWK (RFC 8037), the public key as SPKI DER
// with the fixed Ed25519 prefix (algorithm identifier 1.3.101.112, RFC 8410).
const rfcPrivate = createPrivateKey({ key: { kty: "OKP", crv: "Ed25519", d: b64url(RFC8032_TEST1.secretKey), x: b64url(RFC8032_TEST1.publicKey) }, format: "jwk" });
const rfcPublic = createPublicKey({ key: Buffer.from(`302a300506032b6570032100${RFC8032_TEST1.publicKey}`, "hex"), format: "der", type: "spki" });
const rfcPrivatePem = rfcPrivate.export({ type: "pkcs8", format: "pem" }).toString();
const rfcPublicPem = rfcPublic.export({ type: "spki", format: "pem" }).toString();

describe("Ed25519 signatures against RFC 8032", () => {
  it("derives the test vector's public key from its secret key", () => {
    expect(Buffer.from((createPublicKey(rfcPrivate).export({ format: "jwk" }) as { x: string }).x, "base64url").toString("hex")).toBe(RFC8032_TEST1.publicKey);
  });

  it("signs the empty message exactly as TEST 1 says", () => {
    const sig = signPayload("", rfcPrivatePem);
    expect(Buffer.from(sig, "base64").toString("hex")).toBe(RFC8032_TEST1.signature);
  });

  it("verifies TEST 1's signature with the public key and refuses it for another message", () => {
    const sig = Buffer.from(RFC8032_TEST1.signature, "hex").toString("base64");
    expect(verifyPayload("", sig, rfcPublicPem)).toBe(true);
    expect(verifyPayload("{}", sig, rfcPublicPem)).toBe(false);
  });

  it("takes the keys as base64 DER too, as the environment holds them", () => {
    const der = rfcPrivate.export({ type: "pkcs8", format: "der" }).toString("base64");
    const pubDer = rfcPublic.export({ type: "spki", format: "der" }).toString("base64");
    expect(Buffer.from(signPayload("", der), "base64").toString("hex")).toBe(RFC8032_TEST1.signature);
    expect(verifyPayload("", signPayload("", der), pubDer)).toBe(true);
  });
});

describe("signed payloads", () => {
  const { privateKey, publicKey } = generateKeyPairSync("ed25519");
  const pem = privateKey.export({ type: "pkcs8", format: "pem" }).toString();
  const pub = publicKey.export({ type: "spki", format: "pem" }).toString();

  it("round-trips: what is signed verifies, whatever the key order of the object", () => {
    const canonical = canonicalPayload({ serial: "RL-0001", parameters: { b: 1, a: [true, null] }, contentHash: "ab" });
    expect(canonical).toBe('{"contentHash":"ab","parameters":{"a":[true,null],"b":1},"serial":"RL-0001"}');
    const sig = signPayload(canonical, pem);
    expect(verifyPayload(canonicalPayload({ contentHash: "ab", serial: "RL-0001", parameters: { a: [true, null], b: 1 } }), sig, pub)).toBe(true);
  });

  it("refuses a changed payload, another key and a malformed signature without throwing", () => {
    const canonical = canonicalPayload({ closeTravelCounts: 17_014 });
    const sig = signPayload(canonical, pem);
    expect(verifyPayload(canonicalPayload({ closeTravelCounts: 17_015 }), sig, pub)).toBe(false);
    expect(verifyPayload(canonical, sig, rfcPublicPem)).toBe(false);
    expect(verifyPayload(canonical, "not base64!", pub)).toBe(false);
    expect(verifyPayload(canonical, sig.slice(0, -4), pub)).toBe(false);
  });

  it("refuses a key that is not Ed25519", () => {
    const rsa = generateKeyPairSync("rsa", { modulusLength: 1024 }).privateKey.export({ type: "pkcs8", format: "pem" }).toString();
    expect(() => signPayload("{}", rsa)).toThrow("the signing key must be an Ed25519 private key, got rsa private");
  });

  it("refuses values canonical JSON cannot hold", () => {
    expect(() => canonicalPayload({ x: Number.NaN })).toThrow("/x is NaN");
  });
});

describe("strong ETags", () => {
  it("quotes the hash without a weak prefix (RFC 9110, section 8.8.3)", () => {
    expect(strongEtag("e3b0c44298fc1c149afbf4c8996fb924")).toBe('"e3b0c44298fc1c149afbf4c8996fb924"');
  });

  it("refuses an empty tag, a quote or a space inside it", () => {
    for (const bad of ["", 'a"b', "a b"]) expect(() => strongEtag(bad)).toThrow(TypeError);
  });
});
