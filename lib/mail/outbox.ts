import { deliverDue, enqueueMail, userHasPassword } from "@/db/queries/mail";
import { getEnv } from "@/lib/env";
import { composeInvitation, composePasswordReset, setPasswordLink } from "./templates";
import { getTransport } from "./transport";

/** Queues the invitation (no password yet) or reset message for a set-password token, then kicks delivery. */
export async function queuePasswordMail(opts: { userId: string; email: string; name: string; token: string }) {
  const env = getEnv();
  const kind = (await userHasPassword({ userId: opts.userId })) ? "password_reset" : "invitation";
  const link = setPasswordLink(env.APP_URL, opts.token, kind);
  const compose = kind === "invitation" ? composeInvitation : composePasswordReset;
  const mail = compose({ name: opts.name, link, ttlHours: env.INVITE_TTL_HOURS });
  await enqueueMail({ kind, toAddress: opts.email, subject: mail.subject, textBody: mail.text, htmlBody: mail.html });
  void deliverDueMail();
}

const pending = new Set<Promise<unknown>>();

/** Waits for delivery passes still running (scripts call this before closing the pool). */
export async function settleMailDelivery(): Promise<void> {
  while (pending.size) await Promise.allSettled([...pending]);
}

/** Sends every due outbox message over SMTP; never throws (failures are recorded on the rows). */
export function deliverDueMail(): Promise<{ sent: number; failed: number }> {
  const pass = deliverPass();
  pending.add(pass);
  void pass.finally(() => pending.delete(pass));
  return pass;
}

async function deliverPass(): Promise<{ sent: number; failed: number }> {
  const env = getEnv();
  try {
    return await deliverDue({
      send: async (m) => {
        await getTransport().sendMail({ from: env.MAIL_FROM, to: m.to, subject: m.subject, text: m.text, html: m.html ?? undefined });
      },
    });
  } catch (err) {
    console.error("[roostline] mail delivery pass failed:", err instanceof Error ? err.message : err);
    return { sent: 0, failed: 0 };
  }
}
