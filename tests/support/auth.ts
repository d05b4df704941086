// Test helpers that go through better-auth's real HTTP handler and the real test database.
import { randomBytes } from "node:crypto";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { capturedMails, users } from "@/db/schema";
import { getAuth } from "@/lib/auth/auth";
import type { Role } from "@/lib/auth/permissions";
import { getEnv } from "@/lib/env";

export const uniqueEmail = (tag: string) => `${tag}-${Date.now()}-${randomBytes(3).toString("hex")}@example.test`;

/** Calls better-auth's handler as a browser on APP_URL would. */
export async function authRequest(path: string, body: unknown, cookie?: string): Promise<Response> {
  const base = getEnv().APP_URL;
  const headers: Record<string, string> = { "content-type": "application/json", origin: base };
  if (cookie) headers.cookie = cookie;
  return getAuth().handler(new Request(`${base}/api/auth${path}`, { method: "POST", headers, body: JSON.stringify(body) }));
}

/** Signs in and returns the Cookie header value for the new session. */
export async function signIn(email: string, password: string): Promise<string> {
  const res = await authRequest("/sign-in/email", { email, password });
  if (res.status !== 200) throw new Error(`sign-in of ${email} failed with ${res.status}: ${await res.text()}`);
  return res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
}

/** Creates a user with a password, as the seed does. */
export async function createUser(role: Role, password = "correct-horse-battery") {
  const email = uniqueEmail(role);
  const { user } = await getAuth().api.createUser({ body: { email, password, name: `Test ${role}`, role } });
  return { id: user.id, email, password };
}

/** A signed-in user of a role: id, e-mail and session cookie. */
export async function signedInUser(role: Role) {
  const u = await createUser(role);
  return { ...u, cookie: await signIn(u.email, u.password) };
}

/** A Headers object carrying a session cookie. */
export function withCookie(cookie: string, extra: Record<string, string> = {}): Headers {
  return new Headers({ cookie, origin: getEnv().APP_URL, ...extra });
}

/** Waits until the SMTP stand-in has stored a message to `to`, and returns its text. */
export async function waitForMail(to: string, timeoutMs = 10_000): Promise<string> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const rows = await db.select({ text: capturedMails.textBody }).from(capturedMails).where(eq(capturedMails.envelopeTo, to));
    if (rows.length) return rows[rows.length - 1]!.text;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail to ${to} within ${timeoutMs} ms (is the SMTP stand-in on SMTP_PORT running?)`);
}

/** The set-password token from a message's link. */
export function tokenFrom(text: string): string {
  const m = text.match(/set-password\?token=([A-Za-z0-9_-]+)/);
  if (!m) throw new Error("no set-password link in the message");
  return m[1]!;
}

export async function userRow(userId: string) {
  const [row] = await db.select().from(users).where(eq(users.id, userId));
  return row;
}
