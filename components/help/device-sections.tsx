import { CHECK_IN_PATH, CONFIG_PATH, PUBLIC_KEY_PATH, checkInFields, verificationSteps } from "@/lib/help/device-help";
import { Code, CodeText, HelpSection } from "./help-page";

/** What a controller does with its signed configuration, and what it reports back; worded from the API description. */
export function DeviceSections({ rateLimitPerMinute }: { rateLimitPerMinute: number }) {
  const verify = verificationSteps();
  const fields = checkInFields();
  return (
    <>
      <HelpSection id="signed" title="What a controller does with a signed configuration">
        <p>
          A controller asks for its configuration at <Code>GET {CONFIG_PATH}</Code> with its token, sending the ETag of what it runs. The server answers with the effective
          parameters of the release assigned to it (base, then its site&apos;s overlay, then its own overlay), signed with the server&apos;s Ed25519 key. The public half is
          at <Code>{PUBLIC_KEY_PATH}</Code>, for the firmware to keep.
        </p>
        <ul className="list-disc space-y-1 pl-5">
          <li>
            <strong>304</strong>: nothing changed; it keeps running what it has.
          </li>
          <li>
            <strong>404</strong>: nothing is released to it yet; it keeps running what it has.
          </li>
          <li>
            <strong>200</strong>: a configuration to check before use. <CodeText text={verify.lead} />
          </li>
        </ul>
        <ol className="list-decimal space-y-1 pl-5">
          {verify.steps.map((s) => (
            <li key={s}>
              <CodeText text={s} />
            </li>
          ))}
        </ol>
        {verify.after.map((s) => (
          <p key={s}>
            <CodeText text={s} />
          </p>
        ))}
        <p>
          A controller that applies a configuration reports its <Code>contentHash</Code> back as <Code>appliedHash</Code> at its next check-in. Each controller may make at
          most {rateLimitPerMinute} requests a minute; beyond that it is told to wait.
        </p>
      </HelpSection>
      <HelpSection id="check-ins" title="Check-ins">
        <p>
          Every check-in interval (the <a href="/help/parameters#param-checkInIntervalS">check-in interval</a> parameter) a controller with a network link posts its state to{" "}
          <Code>POST {CHECK_IN_PATH}</Code>. A check-in without an applied configuration must say why.
        </p>
        <dl className="divide-y divide-loam-100 rounded-lg border border-loam-200 bg-white text-sm dark:divide-loam-800 dark:border-loam-800 dark:bg-loam-900">
          {fields.map((f) => (
            <div key={f.name} className="grid gap-x-4 px-3 py-2 sm:grid-cols-[14rem_minmax(0,1fr)]">
              <dt>
                <Code>{f.name}</Code>
              </dt>
              <dd>
                <CodeText text={f.description} />
              </dd>
            </div>
          ))}
        </dl>
        <p>
          The controller&apos;s page plots close counts and travel time from its check-ins. A slow rise in either points at a stretching cord or a tiring motor (common
          practice); a rising stall count, or a time fix older than the alarm setting, is worth a visit.
        </p>
      </HelpSection>
    </>
  );
}
