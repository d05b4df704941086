// Security properties of the running test build: headers and the content security policy, cookie
// attributes, secrets stored only as hashes, and no secret in the server's log.
import { readFileSync } from "node:fs";
import path from "node:path";
import { eq, like } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { controllerTokens, verifications } from "@/db/schema";
import { sha256Hex } from "@/lib/profiles/canonical";
import { storedIdentifier } from "@/lib/auth/verification-id";
import { siteId } from "@/tests/support/fleet";
import { signedInUser, tokenFrom, uniqueEmail, waitForMail } from "@/tests/support/auth";
import { createDoorModel } from "@/tests/support/profiles";

const BASE = process.env.TEST_APP_URL ?? "http://127.0.0.1:3100";
const SERVER_LOG = path.resolve(process.cwd(), ".artifacts", "test-server.log");

const post = (pathname: string, cookie: string, body: unknown) =>
  fetch(`${BASE}${pathname}`, { method: "POST", headers: { cookie, origin: BASE, "content-type": "application/json" }, body: JSON.stringify(body) });

describe("headers", () => {
  it("gives every page a content security policy whose nonce is on each of its scripts", async () => {
    const res = await fetch(`${BASE}/sign-in`);
    const csp = res.headers.get("content-security-policy") ?? "";
    const nonce = /'nonce-([^']+)'/.exec(csp)?.[1];
    expect(nonce, csp).toBeTruthy();
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("object-src 'none'");
    expect(csp).not.toMatch(/script-src[^;]*'unsafe-(inline|eval)'/);
    const html = await res.text();
    const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
    expect(scripts.length).toBeGreaterThan(0);
    for (const tag of scripts) expect(tag, tag).toContain(`nonce="${nonce}"`);
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
    expect(res.headers.get("x-frame-options")).toBe("DENY");
    expect(res.headers.get("referrer-policy")).toBe("same-origin");
    expect(res.headers.get("x-powered-by")).toBeNull();
  });

  it("uses a fresh nonce for every response", async () => {
    const a = (await fetch(`${BASE}/sign-in`)).headers.get("content-security-policy");
    const b = (await fetch(`${BASE}/sign-in`)).headers.get("content-security-policy");
    expect(a).not.toBe(b);
  });

  it("gives JSON answers a policy that allows nothing", async () => {
    const res = await fetch(`${BASE}/api/v1/health`);
    expect(res.headers.get("content-security-policy")).toBe("default-src 'none'; frame-ancestors 'none'");
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
  });
});

describe("cookies", () => {
  it("sets the session cookie http-only and same-site, for the whole app", async () => {
    const res = await fetch(`${BASE}/api/auth/sign-in/email`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: BASE },
      body: JSON.stringify({ email: "viewer@hollowmere.example", password: "roostline-viewer" }),
    });
    expect(res.status).toBe(200);
    const session = res.headers.getSetCookie().find((c) => c.includes("session_token="));
    expect(session).toBeDefined();
    expect(session).toMatch(/;\s*HttpOnly/i);
    expect(session).toMatch(/;\s*SameSite=Lax/i);
    expect(session).toMatch(/;\s*Path=\//i);
    // Secure follows APP_URL: set whenever the app is served over https (production), not on this http loopback.
    expect(/;\s*Secure/i.test(session!)).toBe(BASE.startsWith("https:"));
    expect(await res.text()).not.toContain(session!.split(";")[0]!.split("=")[1]);
  });
});

describe("secrets at rest and in logs", () => {
  it("keeps device and invitation tokens only as hashes, and never writes them to the server log", async () => {
    const technician = await signedInUser("technician");
    const admin = await signedInUser("admin");
    const model = await createDoorModel();
    const serial = `TSEC-${Date.now().toString(36).toUpperCase()}`;
    const reg = await post("/api/v1/controllers", technician.cookie, { serial, doorModelId: model.id, siteId: await siteId(), firmwareVersion: "1.4.2", parameterSetVersion: 2 });
    expect(reg.status).toBe(201);
    const { token } = (await reg.json()) as { token: string };
    // Use it, and misuse it, so the log has had every chance to see it.
    await fetch(`${BASE}/api/v1/controllers/${serial}/config`, { headers: { authorization: `Bearer ${token}` } });
    await fetch(`${BASE}/api/v1/controllers/${serial}/config`, { headers: { authorization: `Bearer ${token}x` } });

    const email = uniqueEmail("sec");
    expect((await post("/api/v1/users", admin.cookie, { name: "Sec Invitee", email, role: "viewer" })).status).toBe(201);
    const invitation = tokenFrom(await waitForMail(email));

    const stored = await db.select({ h: controllerTokens.tokenHash }).from(controllerTokens).where(eq(controllerTokens.tokenHash, sha256Hex(token)));
    expect(stored).toHaveLength(1);
    expect(await db.select().from(controllerTokens).where(like(controllerTokens.tokenHash, `%${token.slice(4, 20)}%`))).toHaveLength(0);

    expect(await db.select().from(verifications).where(like(verifications.identifier, `%${invitation}%`))).toHaveLength(0);
    expect(await db.select().from(verifications).where(eq(verifications.identifier, storedIdentifier(`reset-password:${invitation}`)))).toHaveLength(1);

    const log = readFileSync(SERVER_LOG, "utf8");
    expect(log.includes(token)).toBe(false);
    expect(log.includes(invitation)).toBe(false);
  });
});
