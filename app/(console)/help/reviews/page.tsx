import type { Metadata } from "next";
import Link from "next/link";
import { Code, Facts, HelpPageHeader, HelpSection } from "@/components/help/help-page";
import { getSafetyApprovals } from "@/db/queries/reviews";
import { requirePageUser } from "@/lib/auth/guard";
import { hasPermission, ROLE_LABELS, ROLES, type Permission } from "@/lib/auth/permissions";
import { helpHref } from "@/lib/help/links";
import { parameterInfo } from "@/lib/profiles/parameter-info";

export const metadata: Metadata = { title: "Help: reviews" };

const TOC = [
  { id: "who", label: "Who does what" },
  { id: "steps", label: "From draft to approved" },
  { id: "four-eyes", label: "Four eyes" },
  { id: "safety-approvals", label: "Safety-relevant changes" },
  { id: "content-hash", label: "Decisions tied to the content" },
  { id: "acknowledging", label: "Acknowledging a warning" },
  { id: "after", label: "After approval" },
];

const rolesWith = (permission: Permission) => ROLES.filter((r) => hasPermission(r, permission)).map((r) => ROLE_LABELS[r]).join(", ");

export default async function ReviewsHelpPage() {
  const user = await requirePageUser("dashboard:read");
  const approvals = await getSafetyApprovals();
  const safetyParameters = parameterInfo(2).filter((p, i, all) => p.safety && all.findIndex((q) => q.path === p.path) === i);
  return (
    <>
      <HelpPageHeader
        title="Reviews and approvals"
        intro="No parameter change reaches a door until someone other than its author has looked at exactly that content and approved it."
        toc={TOC}
      />
      <HelpSection id="who" title="Who does what">
        <Facts
          items={[
            ["Edit and submit", rolesWith("profiles:edit")],
            ["Approve or send back", rolesWith("reviews:decide")],
            ["Comment", rolesWith("reviews:comment")],
            ["Set the approvals rule", rolesWith("settings:manage")],
          ]}
        />
      </HelpSection>
      <HelpSection id="steps" title="From draft to approved">
        <ol className="list-decimal space-y-1 pl-5">
          <li>Every save makes a new revision. A document that fails its schema is not saved; safety findings are shown with it.</li>
          <li>The author submits the newest revision. The schema and the safety rules run again: any error stops the submission, and each warning needs an acknowledgement.</li>
          <li>Reviewers get a mail and find the revision under Reviews, with its changes against the last approved revision, the findings and the acknowledgements.</li>
          <li>Each reviewer approves once, or sends it back with a comment saying what should change. One sending back is enough to return it to the author.</li>
          <li>When enough approvals are in, the revision is approved. The author hears by mail at every decision.</li>
        </ol>
        <p>
          While a revision waits, its author may withdraw it (it becomes a draft again). Saving a new revision replaces the one in review: the new one starts its review from
          nothing. After a sending back, the author saves the changes and submits again; decisions from the earlier round no longer count.
        </p>
      </HelpSection>
      <HelpSection id="four-eyes" title="Four eyes">
        <p>
          The author of a revision can never approve it, whatever their role: an admin who wrote a change needs someone else too. Approvals count only from different people,
          one each.
        </p>
      </HelpSection>
      <HelpSection id="safety-approvals" title="Safety-relevant changes">
        <p>
          A revision that changes any safety-relevant parameter compared with the profile&apos;s last approved revision needs{" "}
          <strong>{approvals === 1 ? "one approval" : `${approvals} approvals`}</strong> from different reviewers (the team&apos;s current rule
          {hasPermission(user.role, "settings:manage") ? (
            <>
              , set under <Link href="/admin/settings">Settings</Link>
            </>
          ) : (
            ", which an admin sets"
          )}
          ; between 1 and 5). Any other change needs one. While a profile has no approved revision, every parameter counts as changed. The safety-relevant parameters are:
        </p>
        <ul className="grid gap-x-4 gap-y-0.5 sm:grid-cols-2">
          {safetyParameters.map((p) => (
            <li key={p.path}>
              <a href={helpHref({ parameter: p.path })}>{p.title}</a> <Code>{p.path}</Code>
            </li>
          ))}
        </ul>
      </HelpSection>
      <HelpSection id="content-hash" title="Decisions tied to the content">
        <p>
          Every revision has a content hash: SHA-256 over its canonical JSON (keys sorted, no spaces), so the same content always gives the same hash, in the browser and on
          the server. A revision&apos;s content never changes once saved.
        </p>
        <p>
          A decision carries the hash of the content the reviewer had in front of them. If it is not the revision&apos;s hash, for example because the page was opened before
          a newer revision replaced it, the decision is refused and the reviewer is asked to look at the current content. Only approvals with the revision&apos;s own hash are
          counted. Controllers report the hash of the configuration they run in the same form, which is how drift is seen (see <Link href="/help/fleet#drift">drift</Link>).
        </p>
      </HelpSection>
      <HelpSection id="acknowledging" title="Acknowledging a warning">
        <p>
          A <a href="/help/safety-rules">safety warning</a> does not block a change, but it cannot pass unremarked. When submitting, the author gives a reason for each
          warning&apos;s rule, at least 10 characters: what was checked, why the value is right for this door, or what is done instead. The reason is stored with the revision
          and shown to every reviewer, who judge it as part of the change. A new submission asks again.
        </p>
        <p>
          Good reasons name evidence: &ldquo;threshold checked against a calibration run on the installed door; obstacle stop tested afterwards&rdquo;. &ldquo;OK&rdquo;
          is not a reason.
        </p>
      </HelpSection>
      <HelpSection id="after" title="After approval">
        <p>
          Approval alone changes no door. An admin releases an approved base revision; the site and controller overlays approved at that moment go with it. See{" "}
          <Link href="/help/fleet#releases">staged releases</Link>.
        </p>
      </HelpSection>
    </>
  );
}
