import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { admin } from "better-auth/plugins";
import { db } from "@/db/client";
import * as schema from "@/db/schema";
import { getEnv } from "@/lib/env";
import { queuePasswordMail } from "@/lib/mail/outbox";
import { ac, authRoles } from "./access";
import { storedIdentifier } from "./verification-id";

export const MIN_PASSWORD_LENGTH = 10;

function createAuth() {
  const env = getEnv();
  return betterAuth({
    appName: "Roostline",
    baseURL: env.APP_URL,
    secret: env.BETTER_AUTH_SECRET,
    database: drizzleAdapter(db, { provider: "mysql", schema, usePlural: true }),
    emailAndPassword: {
      enabled: true,
      disableSignUp: true,
      minPasswordLength: MIN_PASSWORD_LENGTH,
      maxPasswordLength: 128,
      // One lifetime for invitation and reset links: both set a password once.
      resetPasswordTokenExpiresIn: Math.round(env.INVITE_TTL_HOURS * 3600),
      revokeSessionsOnPasswordReset: true,
      // better-auth swallows errors thrown here, so this only queues; delivery is tracked in the outbox.
      sendResetPassword: async ({ user, token }) => {
        await queuePasswordMail({ userId: user.id, email: user.email, name: user.name, token });
      },
    },
    // Invitation and reset links are checked against their hash, so a copy of the database opens no account.
    verification: { storeIdentifier: { hash: async (identifier: string) => storedIdentifier(identifier) } },
    session: {
      expiresIn: 60 * 60 * 24 * 7,
      updateAge: 60 * 60 * 24,
      // Off on purpose: a deactivated user's sessions must end on their next request.
      cookieCache: { enabled: false },
    },
    rateLimit: {
      enabled: env.AUTH_RATE_LIMIT,
      // In the database, so a second app instance does not give a guesser a second allowance.
      storage: "database",
      window: 60,
      max: 100,
      customRules: { "/sign-in/email": { window: 10, max: 5 }, "/request-password-reset": { window: 60, max: 5 } },
    },
    advanced: {
      ipAddress: { ipAddressHeaders: [env.AUTH_IP_HEADER] },
      database: { generateId: () => crypto.randomUUID() },
    },
    telemetry: { enabled: false },
    plugins: [
      admin({ ac, roles: authRoles, defaultRole: "viewer", adminRoles: ["admin"], bannedUserMessage: "deactivated" }),
      nextCookies(), // must stay last
    ],
  });
}

type Auth = ReturnType<typeof createAuth>;
const globalForAuth = globalThis as unknown as { roostlineAuth?: Auth };

/** The better-auth instance, created on first use so that builds need no secret. */
export function getAuth(): Auth {
  globalForAuth.roostlineAuth ??= createAuth();
  return globalForAuth.roostlineAuth;
}
