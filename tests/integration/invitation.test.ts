import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { POST as invite } from "@/app/api/v1/users/route";
import { db } from "@/db/client";
import { verifications } from "@/db/schema";
import { authRequest, signIn, signedInUser, tokenFrom, uniqueEmail, waitForMail, withCookie } from "@/tests/support/auth";
import { storedIdentifier } from "@/lib/auth/verification-id";

function inviteRequest(cookie: string, body: unknown) {
  return new Request("http://127.0.0.1:3100/api/v1/users", { method: "POST", headers: withCookie(cookie, { "content-type": "application/json" }), body: JSON.stringify(body) });
}

describe("invitation → accept → sign in", () => {
  it("lets an invitee set a password from the mailed link and sign in with it", async () => {
    const admin = await signedInUser("admin");
    const email = uniqueEmail("invitee");
    const res = await invite(inviteRequest(admin.cookie, { name: "Nell Invitee", email, role: "technician" }), {});
    expect(res.status).toBe(201);

    const text = await waitForMail(email);
    expect(text).toContain("invited to Roostline");
    const token = tokenFrom(text);

    // Not signable before a password exists.
    expect((await authRequest("/sign-in/email", { email, password: "whatever-long-1" })).status).toBe(401);

    const set = await authRequest("/reset-password", { token, newPassword: "a-brand-new-secret" });
    expect(set.status).toBe(200);
    const cookie = await signIn(email, "a-brand-new-secret");
    expect(cookie).toContain("session_token");
  });

  it("refuses the same link a second time", async () => {
    const admin = await signedInUser("admin");
    const email = uniqueEmail("reuse");
    await invite(inviteRequest(admin.cookie, { name: "Reuse", email, role: "viewer" }), {});
    const token = tokenFrom(await waitForMail(email));
    expect((await authRequest("/reset-password", { token, newPassword: "first-password-ok" })).status).toBe(200);
    const again = await authRequest("/reset-password", { token, newPassword: "second-password-no" });
    expect(again.status).toBe(400);
    expect(await again.json()).toMatchObject({ code: "INVALID_TOKEN" });
    // The first password still works; the second never took.
    await expect(signIn(email, "first-password-ok")).resolves.toContain("session_token");
    await expect(signIn(email, "second-password-no")).rejects.toThrow(/401/);
  });

  it("refuses an expired link", async () => {
    const admin = await signedInUser("admin");
    const email = uniqueEmail("expired");
    await invite(inviteRequest(admin.cookie, { name: "Late", email, role: "viewer" }), {});
    const token = tokenFrom(await waitForMail(email));
    await db
      .update(verifications)
      .set({ expiresAt: new Date(Date.now() - 60_000) })
      .where(eq(verifications.identifier, storedIdentifier(`reset-password:${token}`)));
    const res = await authRequest("/reset-password", { token, newPassword: "too-late-password" });
    expect(res.status).toBe(400);
    expect(await res.json()).toMatchObject({ code: "INVALID_TOKEN" });
  });

  it("refuses a second invitation to an address that already has an account", async () => {
    const admin = await signedInUser("admin");
    const email = uniqueEmail("twice");
    expect((await invite(inviteRequest(admin.cookie, { name: "Once", email, role: "viewer" }), {})).status).toBe(201);
    const res = await invite(inviteRequest(admin.cookie, { name: "Twice", email, role: "viewer" }), {});
    expect(res.status).toBe(409);
    expect((await res.json()).issues).toEqual([{ path: "/email", message: "Already in use" }]);
  });
});
