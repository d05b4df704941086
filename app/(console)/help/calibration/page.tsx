import type { Metadata } from "next";
import Link from "next/link";
import { Caution } from "@/components/help/caution";
import { Code, Facts, HelpPageHeader, HelpSection } from "@/components/help/help-page";
import { DataTable, Td } from "@/components/ui/surface";
import { requirePageUser } from "@/lib/auth/guard";
import { hasPermission, ROLE_LABELS, ROLES, type Permission } from "@/lib/auth/permissions";
import { DIRECTION_SPEED_SPREAD, END_TOLERANCE_COUNTS, SENSOR_EDGE_SHARE, SETTLED_SHARE, STEADY_SHARE } from "@/lib/calibration/analyse";
import { CALIBRATION_MAX_ISSUES, CALIBRATION_MAX_ROWS, JUMP_FACTOR, JUMP_MIN_COUNTS } from "@/lib/calibration/csv";
import * as S from "@/lib/calibration/suggest";
import { helpHref } from "@/lib/help/links";
import { num, pct } from "@/lib/profiles/safety/format";
import { CALIBRATION_MAX_BYTES } from "@/lib/releases/calibration";

export const metadata: Metadata = { title: "Help: calibration" };

const TOC = [
  { id: "recording", label: "Recording a run" },
  { id: "csv", label: "The CSV file" },
  { id: "analysis", label: "What the run tells" },
  { id: "suggestions", label: "Suggested values" },
  { id: "draft", label: "The draft overlay" },
];

const COLUMNS = [
  ["time_ms", "required", "Time of the sample in milliseconds, a decimal number from any starting point (the controller's uptime will do); it must increase from row to row."],
  ["counts", "required", "Encoder position, a whole number. The firmware counts up from the open end stop while closing."],
  ["velocity_cps", "optional", "The controller's own velocity reading in counts per second. Without it the velocity is worked out from counts and time."],
  ["open_sensor", "optional", "1 while the open end-stop sensor sees the door, 0 otherwise, whatever the sensor's electrical level."],
] as const;

const rolesWith = (permission: Permission) => ROLES.filter((r) => hasPermission(r, permission)).map((r) => ROLE_LABELS[r]).join(", ");
const ms = (value: number) => `${num(value)} ms`;

export default async function CalibrationHelpPage() {
  await requirePageUser("dashboard:read");
  return (
    <>
      <HelpPageHeader
        title="Calibration on site"
        intro="A calibration run is the door's own record of one close and one open. From it Roostline reads the door's real travel and speed and suggests the drive values, as a draft for review."
        toc={TOC}
      />
      <HelpSection id="recording" title="Recording a run">
        <ol className="list-decimal space-y-1 pl-5">
          <li>Work on the installed door, with its own cord, load and supply, and nothing in the doorway. Keep the birds away from the door while you test.</li>
          <li>Start with the door at rest at an end stop, have the controller log its encoder, and let the door close fully and open again. Stop logging with the door at rest.</li>
          <li>
            Open the controller&apos;s page in Roostline (it works on a phone), choose the file under Calibration runs and wait for the plot. Uploading needs the role{" "}
            {rolesWith("calibrations:upload")}.
          </li>
          <li>Read the remarks under the plot before using the numbers. A run that starts or ends between the end stops reads a travel shorter than the door&apos;s.</li>
        </ol>
      </HelpSection>
      <HelpSection id="csv" title="The CSV file">
        <p>
          UTF-8 text, comma separated, a header row first, then one sample a row. Column names are case-blind and may come in any order; other columns are ignored with a
          remark. An optional column, once present, needs a value on every row. At most {num(CALIBRATION_MAX_ROWS)} samples and {num(CALIBRATION_MAX_BYTES / 1048576)} MiB.
        </p>
        <DataTable caption="Calibration CSV columns" headers={["Column", "", "Meaning"]}>
          {COLUMNS.map(([name, need, text]) => (
            <tr key={name}>
              <Td>
                <Code>{name}</Code>
              </Td>
              <Td className="text-xs">{need}</Td>
              <Td>{text}</Td>
            </tr>
          ))}
        </DataTable>
        <pre className="overflow-x-auto rounded-lg bg-loam-100 p-3 font-mono text-xs dark:bg-loam-800">{"time_ms,counts,velocity_cps,open_sensor\n0,0,0,1\n7,0,0,1\n…"}</pre>
        <Facts
          items={[
            ["Refused", `A missing or non-numeric value, a count with a fraction, an open_sensor other than 0 or 1, time going backwards, or more values than the header has. Every row is checked and the first ${CALIBRATION_MAX_ISSUES} problems are listed by row; nothing is stored.`],
            ["Read, with a remark", `A repeated time (the later row is dropped), and a jump in counts of more than ${num(JUMP_MIN_COUNTS)} and more than ${num(JUMP_FACTOR)} × the run's usual rate: a lost encoder edge, a counter overflow or a glitch.`],
          ]}
        />
      </HelpSection>
      <HelpSection id="analysis" title="What the run tells">
        <Facts
          items={[
            ["Full travel", `The counts from one end to the other. Within ${num(END_TOLERANCE_COUNTS)} counts of an end the door counts as at that end.`],
            ["Running speed", `Per direction, the median of the samples at or above ${pct(STEADY_SHARE)} of that direction's peak. The closing speed is the one that matters, since trapping happens while closing.`],
            ["Ramp", `From leaving an end until within ${pct(1 - SETTLED_SHARE)} of the running speed; the longer of the run's ramps is used.`],
            ["Travel time", "Per direction, from the last sample at one end to the first at the other; the longer is used."],
            ["Remarks", `Closing and opening speeds more than ${pct(DIRECTION_SPEED_SPREAD)} apart; an open sensor switching more than ${pct(SENSOR_EDGE_SHARE)} of the travel from the open end; counts running down while closing (swap the encoder's A and B channels and record again).`],
          ]}
        />
      </HelpSection>
      <HelpSection id="suggestions" title="Suggested values">
        <p>Each value comes with its reason and the numbers from the run. They are a starting point for a reviewed parameter set, not a finished one.</p>
        <Facts
          items={[
            [
              "Close travel",
              <>
                The full travel less {pct(S.DEFAULT_CLOSE_MARGIN_SHARE)}, so the motor stops short of slackening the cord. <a href={helpHref({ parameter: "/closeTravelCounts" })}>Parameter</a>
              </>,
            ],
            [
              "Stall threshold",
              <>
                {pct(S.DEFAULT_STALL_FRACTION)} of the closing speed, rounded to 10 counts/s. <a href={helpHref({ parameter: "/stall/thresholdCps" })}>Parameter</a>
              </>,
            ],
            [
              "Stall window",
              <>
                The shortest multiple of {ms(S.WINDOW_STEP_MS)} that holds {num(S.WINDOW_MIN_COUNTS)} counts at the threshold, kept between {ms(S.WINDOW_MIN_MS)} and {ms(S.WINDOW_MAX_MS)}.{" "}
                <a href={helpHref({ parameter: "/stall/windowMs" })}>Parameter</a>
              </>,
            ],
            [
              "Start-up blanking",
              <>
                The ramp plus one window, rounded up to {ms(S.BLANKING_STEP_MS)}. <a href={helpHref({ parameter: "/stall/startupBlankingMs" })}>Parameter</a>
              </>,
            ],
            [
              "Travel timeout",
              <>
                {num(S.TIMEOUT_FACTOR)} × the longer travel time, at least the travel time plus {num(S.TIMEOUT_MIN_EXTRA_MS / 1000)} s, rounded up to a whole second.{" "}
                <a href={helpHref({ parameter: "/travelTimeoutMs" })}>Parameter</a>
              </>,
            ],
          ]}
        />
        <p>A value the schema does not allow is brought inside its range and flagged: check the run before using it. The rules of thumb above are common practice.</p>
        <Caution short />
      </HelpSection>
      <HelpSection id="draft" title="The draft overlay">
        <p>
          Under the suggestions, &ldquo;Make these a draft overlay&rdquo; writes the five values into the controller&apos;s own overlay: a new overlay named after the
          serial, or a new revision of the existing one with its other values kept. The door model&apos;s base profile must exist and use parameter set 2.
        </p>
        <p>
          The draft changes nothing on the door. An engineer submits it for <Link href="/help/reviews">review</Link>; the safety rules run on it, and when it changes
          safety-relevant parameters, as it usually does, it needs the safety approvals. Once approved it reaches the controller with the next{" "}
          <Link href="/help/fleet#releases">release</Link> of its door model. When it has, test the obstacle stop on the door.
        </p>
      </HelpSection>
    </>
  );
}
