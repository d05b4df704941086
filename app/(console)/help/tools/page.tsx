import type { Metadata } from "next";
import Link from "next/link";
import { Code, HelpPageHeader, HelpSection } from "@/components/help/help-page";
import { Badge } from "@/components/ui/surface";
import { requirePageUser } from "@/lib/auth/guard";
import { TOOL_HELP, type SourceKind } from "@/lib/help/tool-help";

export const metadata: Metadata = { title: "Help: tools" };

const KIND: Record<SourceKind, { tone: "info" | "good" | "neutral" | "warn"; label: string }> = {
  published: { tone: "good", label: "published" },
  "worked out": { tone: "info", label: "worked out" },
  "from memory": { tone: "neutral", label: "from memory" },
  "common practice": { tone: "warn", label: "common practice" },
};

export default async function ToolsHelpPage() {
  await requirePageUser("dashboard:read");
  return (
    <>
      <HelpPageHeader
        title="Tools and their sources"
        intro="The calculators behind the profiles. The safety rules and the calibration suggestions call the same functions, so a number on a tool page is the number a check uses."
        toc={[{ id: "labels", label: "How sources are marked" }, ...TOOL_HELP.map((t) => ({ id: `tool-${t.slug}`, label: t.name }))]}
      />
      <HelpSection id="labels" title="How sources are marked">
        <ul className="space-y-1">
          <li>
            <Badge tone={KIND.published.tone}>published</Badge> a named publication or standard.
          </li>
          <li>
            <Badge tone={KIND["worked out"].tone}>worked out</Badge> geometry or circuit theory, derived here and covered by unit tests.
          </li>
          <li>
            <Badge tone={KIND["from memory"].tone}>from memory</Badge> recalled, not looked up again; treat it as a good guess.
          </li>
          <li>
            <Badge tone={KIND["common practice"].tone}>common practice</Badge> the trade&apos;s habit, with no published source.
          </li>
        </ul>
      </HelpSection>
      {TOOL_HELP.map((t) => (
        <HelpSection key={t.slug} id={`tool-${t.slug}`} title={t.name}>
          <p>
            {t.what} <Link href={`/tools/${t.slug}`}>Open the tool</Link>.
          </p>
          <p className="text-sm text-loam-600 dark:text-loam-400">{t.usedBy}</p>
          <ul className="space-y-2">
            {t.sources.map((s) => (
              <li key={s.text} className="flex flex-col gap-1 sm:flex-row sm:items-baseline sm:gap-2">
                <span className="shrink-0">
                  <Badge tone={KIND[s.kind].tone}>{KIND[s.kind].label}</Badge>
                </span>
                <span>{s.text}</span>
              </li>
            ))}
          </ul>
          <p className="text-sm">
            Also as <Code>/api/v1/tools/{t.slug}</Code> and on the command line: <Code>npm run roostline -- {t.slug}</Code>.
          </p>
        </HelpSection>
      ))}
    </>
  );
}
