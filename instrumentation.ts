// Starts the outbox delivery loop in each server process, so queued or failed mail is retried
// even if nobody visits the mail page. SKIP LOCKED keeps several instances from double-sending.
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { deliverDueMail } = await import("@/lib/mail/outbox");
  const timer = setInterval(() => void deliverDueMail(), 15_000);
  timer.unref();
}
