import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { PageHeader, Panel } from "@/components/ui/surface";
import { getCapturedMail } from "@/db/queries/mail";
import { requirePageUser } from "@/lib/auth/guard";
import { extractLinks } from "@/lib/mail/templates";
import { formatUtc } from "@/lib/time/local-time";

export const metadata: Metadata = { title: "Captured message" };

export default async function CapturedMailPage({ params }: { params: Promise<{ mailId: string }> }) {
  await requirePageUser("mail:read");
  const { mailId } = await params;
  const id = Number(mailId);
  if (!Number.isSafeInteger(id) || id <= 0) notFound();
  const mail = await getCapturedMail({ mailId: id });
  if (!mail) notFound();
  const links = extractLinks(mail.textBody);
  return (
    <>
      <p className="mb-2 text-sm">
        <Link href="/admin/mail">← All mail</Link>
      </p>
      <PageHeader title={mail.subject} />
      <Panel>
        <dl className="mb-4 grid grid-cols-[6rem_1fr] gap-y-1 text-sm">
          <dt className="text-loam-600 dark:text-loam-400">From</dt>
          <dd>{mail.envelopeFrom}</dd>
          <dt className="text-loam-600 dark:text-loam-400">To</dt>
          <dd>{mail.envelopeTo}</dd>
          <dt className="text-loam-600 dark:text-loam-400">Received</dt>
          <dd>{formatUtc(mail.receivedAt)}</dd>
        </dl>
        {links.length > 0 && (
          <div className="mb-4">
            <h2 className="mb-1 text-sm font-semibold">Links in this message</h2>
            <ul className="space-y-1 text-sm">
              {links.map((l) => (
                <li key={l}>
                  <a href={l} className="break-all" data-testid="mail-link">
                    {l}
                  </a>
                </li>
              ))}
            </ul>
          </div>
        )}
        <h2 className="mb-1 text-sm font-semibold">Text</h2>
        <pre className="whitespace-pre-wrap break-words rounded bg-loam-50 p-3 font-mono text-sm dark:bg-loam-950">{mail.textBody}</pre>
      </Panel>
    </>
  );
}
