import type { Metadata } from "next";
import { Caution } from "@/components/help/caution";
import { HelpPageHeader, HelpSection } from "@/components/help/help-page";
import { RuleEntry } from "@/components/help/rule-entry";
import { requirePageUser } from "@/lib/auth/guard";
import { helpHref } from "@/lib/help/links";
import { ruleHelpEntries } from "@/lib/help/rule-help";

export const metadata: Metadata = { title: "Help: safety rules" };

// Rules in the order the catalog lists them, shown in three bands by the parameters they look at.
const BANDS = [
  { id: "drive-rules", label: "Drive and stall check", match: (id: string) => /^RL-(NO-REFERENCE|STALL|TIMEOUT|CLOSE)/.test(id) },
  { id: "schedule-rules", label: "Schedule and sun", match: (id: string) => /^RL-(SCHEDULE|DUSK|SUNRISE|POLAR|NO-SITE)/.test(id) },
  { id: "clock-rules", label: "Clock, power-up and homing", match: () => true },
];

export default async function SafetyRulesHelpPage() {
  await requirePageUser("dashboard:read");
  const rules = ruleHelpEntries();
  const banded = BANDS.map((b, i) => ({ ...b, rules: rules.filter((r) => b.match(r.id) && !BANDS.slice(0, i).some((earlier) => earlier.match(r.id))) }));
  return (
    <>
      <HelpPageHeader
        title="Safety rules"
        intro="Checks that a JSON Schema cannot express: the drive values against the door, the schedule against the site's sun, the clock against its source. Each rule has a stable id you can quote."
        toc={[{ id: "how-findings-work", label: "How findings work" }, ...banded.map((b) => ({ id: b.id, label: b.label }))]}
      />
      <Caution />
      <HelpSection id="how-findings-work" title="How findings work">
        <p>
          The rules run as you edit, again on every save and submit, and once more for every controller a release would reach. A finding names its rule, the parameters
          it concerns and the numbers behind it.
        </p>
        <ul className="list-disc space-y-1 pl-5">
          <li>
            <strong>Error</strong>: the revision cannot be submitted for review, and a release that would give any controller an erroring configuration is refused.
          </li>
          <li>
            <strong>Warning</strong>: the author acknowledges it with a reason when submitting; reviewers see the reason beside the finding. See{" "}
            <a href="/help/reviews#acknowledging">acknowledging a warning</a>.
          </li>
        </ul>
        <p>
          Rules compare with what they know about the door and the site: the door model&apos;s drive train and the site&apos;s position and time zone. When one is missing,{" "}
          <a href={helpHref({ ruleId: "RL-NO-REFERENCE" })}>RL-NO-REFERENCE</a> or <a href={helpHref({ ruleId: "RL-NO-SITE" })}>RL-NO-SITE</a> says so instead of staying
          silent. Passing every rule does not make a door safe: it means none of these checks found a problem.
        </p>
      </HelpSection>
      {banded.map((b) => (
        <section key={b.id} id={b.id} aria-labelledby={`${b.id}-title`} className="mt-8 scroll-mt-4">
          <h2 id={`${b.id}-title`} className="mb-3 text-xl font-semibold tracking-tight">
            {b.label}
          </h2>
          <div className="grid items-start gap-4 lg:grid-cols-2">
            {b.rules.map((r) => (
              <RuleEntry key={r.id} rule={r} />
            ))}
          </div>
        </section>
      ))}
    </>
  );
}
