import type { Metadata } from "next";
import Link from "next/link";
import { Caution } from "@/components/help/caution";
import { DeviceSections } from "@/components/help/device-sections";
import { Code, Facts, HelpPageHeader, HelpSection } from "@/components/help/help-page";
import { requirePageUser } from "@/lib/auth/guard";
import { hasPermission, ROLE_LABELS, ROLES, type Permission } from "@/lib/auth/permissions";
import { getEnv } from "@/lib/env";
import { CONTROLLER_COLUMNS, CONTROLLERS_MAX_ROWS, SERIAL_MAX, SERIAL_MIN } from "@/lib/fleet/controllers-csv";
import { STAGE_BUCKETS } from "@/lib/fleet/stage";
import { num } from "@/lib/profiles/safety/format";

export const metadata: Metadata = { title: "Help: fleet" };

const TOC = [
  { id: "sites", label: "Sites" },
  { id: "controllers", label: "Controllers" },
  { id: "tokens", label: "Device tokens" },
  { id: "releases", label: "Staged releases" },
  { id: "changing", label: "Widen, pause, roll back" },
  { id: "signed", label: "Signed configurations" },
  { id: "check-ins", label: "Check-ins" },
  { id: "drift", label: "Drift" },
];

const rolesWith = (permission: Permission) => ROLES.filter((r) => hasPermission(r, permission)).map((r) => ROLE_LABELS[r]).join(", ");

export default async function FleetHelpPage() {
  await requirePageUser("dashboard:read");
  return (
    <>
      <HelpPageHeader
        title="Sites, controllers and releases"
        intro="How an approved revision gets from Roostline to the doors: who registers what, how releases are staged, and how you can tell what each door runs."
        toc={TOC}
      />
      <Caution />
      <HelpSection id="sites" title="Sites">
        <p>
          A site is a farm or house where doors run, with its position (latitude and longitude) and its IANA time zone. The position decides sunrise and civil dusk, and so
          the door times of a sun schedule; the safety rules check schedules and time sources against it. The time zone must be the site&apos;s own: a
          profile whose zone keeps a different clock is stopped by RL-TIME-ZONE.
        </p>
        <Facts items={[["Who adds and edits", rolesWith("sites:manage")]]} />
      </HelpSection>
      <HelpSection id="controllers" title="Controllers">
        <p>
          A controller is one installed door controller, known by its serial ({SERIAL_MIN} to {SERIAL_MAX} capital letters, digits and single hyphens). It belongs to a door
          model (which fixes its drive train and base profile) and a site, and records its firmware version and the parameter set that firmware runs. Register one on the
          Controllers page, or many from a CSV file with the columns {CONTROLLER_COLUMNS.map((c, i) => (
            <span key={c}>
              {i > 0 && ", "}
              <Code>{c}</Code>
            </span>
          ))}{" "}
          (at most {num(CONTROLLERS_MAX_ROWS)} rows; nothing is imported while any row is wrong).
        </p>
        <Facts
          items={[
            ["Who registers and moves", rolesWith("controllers:manage")],
            ["Who sees", rolesWith("controllers:read")],
          ]}
        />
      </HelpSection>
      <HelpSection id="tokens" title="Device tokens">
        <p>
          Each controller authenticates with its own token, sent as <Code>Authorization: Bearer …</Code>. The token is shown once, when the controller is registered or when
          a new one is issued: copy it into the controller then. Roostline keeps only its SHA-256, so a lost token cannot be shown again, only replaced.
        </p>
        <ul className="list-disc space-y-1 pl-5">
          <li>A new token replaces the old one at once; the controller must be given the new one.</li>
          <li>Revoking ends access: the controller&apos;s next request is refused. Do this for a controller that is lost, stolen or taken out of service.</li>
          <li>A token only works for its own controller&apos;s serial.</li>
        </ul>
        <Facts items={[["Who issues and revokes", rolesWith("tokens:manage")]]} />
      </HelpSection>
      <HelpSection id="releases" title="Staged releases">
        <p>
          A release puts an approved base revision on a target: every controller of its door model, the controllers at one site, or a list of serials. The site and
          controller overlays approved at that moment go with it, pinned: an overlay approved later reaches doors only with the next release.
        </p>
        <p>
          A release starts at a share of its target. Every controller has a fixed bucket from 0 to {STAGE_BUCKETS - 1}, taken from a hash of its serial; a release at p %
          reaches the buckets below p. The bucket never changes, so widening from 10 % to 50 % to 100 % only ever adds controllers, and the first stage is the same set of
          doors every time. Start small, with doors someone can watch.
        </p>
        <p>
          Before a release is made, the effective configuration of every controller it covers is checked against the schema and the safety rules with that
          controller&apos;s site. If any would fail, or any controller runs the other parameter set, the release is refused and the preview lists them. The preview also lists
          the safety-relevant changes against the release now in force.
        </p>
        <p>
          A controller gets the newest release that covers it and whose stage includes it. A controller outside every stage keeps what it runs.
        </p>
        <Facts items={[["Who releases", rolesWith("releases:manage")]]} />
      </HelpSection>
      <HelpSection id="changing" title="Widen, pause, roll back">
        <Facts
          items={[
            ["Widen", "Raise the share. A release never shrinks; to take it away from doors, roll it back."],
            ["Pause", "Stops widening. Controllers already in its stage keep it. Resume to carry on."],
            [
              "Roll back",
              "Ends the release for good. At their next poll its controllers fall back to the newest other release that covers them, or keep what they run when there is none. To use the revision again, release it anew.",
            ],
          ]}
        />
        <p>
          Every change takes effect at each controller&apos;s next poll. Be on hand, or have someone on site, when a release reaches doors with birds behind them, and test
          the obstacle stop on a door that got a new drive or stall value.
        </p>
      </HelpSection>
      <DeviceSections rateLimitPerMinute={getEnv().DEVICE_RATE_LIMIT_PER_MINUTE} />
      <HelpSection id="drift" title="Drift">
        <p>
          Roostline knows which configuration each controller should run (the assigned one, from its release) and which it says it runs (the <Code>appliedHash</Code> of its
          last check-in). When the two differ, the controller is drifting: the Controllers list and the controller&apos;s page mark it.
        </p>
        <ul className="list-disc space-y-1 pl-5">
          <li>It has not polled since the release changed: give it time, then look at its last-seen time.</li>
          <li>It refused the configuration: its check-ins give the reason (a signature or serial that did not verify, for example).</li>
          <li>It is offline: its last-seen time stops moving and its check-ins stop.</li>
        </ul>
        <p>
          A controller that has never reported counts as drifting in the list; its own page says &ldquo;not yet reported&rdquo;. See also <Link href="/help/reviews#content-hash">content hashes</Link>.
        </p>
      </HelpSection>
    </>
  );
}
