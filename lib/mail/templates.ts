// Pure message composition: no I/O, so wording and links are unit-testable.

export type ComposedMail = { subject: string; text: string; html: string };

function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
}

function hoursText(hours: number): string {
  if (hours >= 48 && hours % 24 === 0) return `${hours / 24} days`;
  if (hours >= 1) return `${Math.round(hours)} hours`;
  return `${Math.max(1, Math.round(hours * 60))} minutes`;
}

function layout(paragraphs: string[], link: string, linkLabel: string): string {
  const body = paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join("\n");
  return `<!doctype html><html><body style="font-family:sans-serif;line-height:1.5">
${body}
<p><a href="${escapeHtml(link)}">${escapeHtml(linkLabel)}</a></p>
</body></html>`;
}

/** The link a person follows to set their password. */
export function setPasswordLink(appUrl: string, token: string, kind: "invitation" | "password_reset"): string {
  const url = new URL("/set-password", appUrl);
  url.searchParams.set("token", token);
  if (kind === "invitation") url.searchParams.set("welcome", "1");
  return url.toString();
}

/** The invitation an admin sends to a new colleague. */
export function composeInvitation(opts: { name: string; link: string; ttlHours: number }): ComposedMail {
  const lines = [
    `Hello ${opts.name},`,
    "You have been invited to Roostline, where your team keeps the parameter profiles of its pop-hole door controllers.",
    `Choose your password with the link below. It works once and expires in ${hoursText(opts.ttlHours)}.`,
  ];
  return {
    subject: "Your Roostline invitation",
    text: `${lines.join("\n\n")}\n\n${opts.link}\n\nIf you did not expect this, ignore this message.\n`,
    html: layout(lines, opts.link, "Set my password"),
  };
}

/** The message for someone who asked to reset a forgotten password. */
export function composePasswordReset(opts: { name: string; link: string; ttlHours: number }): ComposedMail {
  const lines = [
    `Hello ${opts.name},`,
    "Someone asked to reset your Roostline password.",
    `Choose a new one with the link below. It works once and expires in ${hoursText(opts.ttlHours)}.`,
  ];
  return {
    subject: "Reset your Roostline password",
    text: `${lines.join("\n\n")}\n\n${opts.link}\n\nIf you did not ask for this, ignore this message; your password stays as it is.\n`,
    html: layout(lines, opts.link, "Choose a new password"),
  };
}

/** Absolute http(s) links in a text, in order, without duplicates. */
export function extractLinks(text: string): string[] {
  const found = text.match(/https?:\/\/[^\s<>"')]+/g) ?? [];
  return [...new Set(found.map((l) => l.replace(/[.,;:]+$/, "")))];
}

/** The delay before the next delivery attempt after `attempts` failures (capped at one hour). */
export function retryDelaySeconds(attempts: number): number {
  return Math.min(3600, 15 * 2 ** Math.max(0, attempts - 1));
}
