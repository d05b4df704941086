"use client";
import { Badge, DataTable, Td } from "@/components/ui/surface";
import { describeFlags } from "@/lib/timecode/frames";
import type { Check, FrameDecode } from "@/lib/timecode/types";

/** ok / failed as a badge with words, so the state never rests on colour alone. */
export function StatusBadge({ ok }: { ok: boolean | null }) {
  if (ok === null) return <Badge>not checked</Badge>;
  return <Badge tone={ok ? "good" : "bad"}>{ok ? "ok" : "failed"}</Badge>;
}

/** The decoded minute, its flags and the check list. */
export function FrameSummary({ result }: { result: FrameDecode }) {
  const i = result.instant;
  const failed = result.checks.filter((c) => !c.ok);
  const flags = describeFlags(result.flags);
  return (
    <div className="space-y-4">
      <div>
        <p className="text-sm text-loam-600 dark:text-loam-400">{failed.length ? `${failed.length} of ${result.checks.length} checks failed` : `All ${result.checks.length} checks pass`}</p>
        {i.local ? (
          <p className="mt-1 font-mono text-lg">
            {i.local}
            {i.zone && <span className="ml-2 font-sans text-sm">({i.zone})</span>}
          </p>
        ) : (
          <p className="mt-1">Not a valid time: the fields read {`${i.year}-${i.month}-${i.day} ${i.hour}:${i.minute}`}.</p>
        )}
        {i.utc && i.zone !== "UTC" && <p className="font-mono text-sm">= {i.utc}</p>}
        <p className="mt-1 text-sm text-loam-600 dark:text-loam-400">
          {result.names === "following minute" ? "The frame names the minute mark at its end: it is sent during the minute before." : "The frame names the minute it is sent in, from the marker at second 0."}
        </p>
        {flags.length > 0 && <p className="mt-1 text-sm">Flags: {flags.join(" · ")}</p>}
      </div>
      <CheckList checks={result.checks} />
    </div>
  );
}

/** Every parity and consistency check with its outcome in words. */
export function CheckList({ checks }: { checks: readonly Check[] }) {
  return (
    <ul className="space-y-1.5 text-sm" aria-label="Checks">
      {checks.map((c) => (
        <li key={c.id} className="flex flex-wrap items-baseline gap-2">
          <StatusBadge ok={c.ok} />
          <span className={c.ok ? "" : "font-medium"}>{c.label}</span>
          <span className="text-loam-600 dark:text-loam-400">— {c.detail}</span>
        </li>
      ))}
    </ul>
  );
}

/** One row per second: what was sent, what it means, and whether its checks passed. */
export function BitTable({ result }: { result: FrameDecode }) {
  return (
    <div className="max-h-[32rem] overflow-y-auto" tabIndex={0} role="region" aria-label="Bit table, scrollable">
      <DataTable caption="Each second of the frame with its value, field and check status" headers={["Second", "Value", "Field", "Checks"]}>
        {result.rows.map((r) => (
          <tr key={r.second} className={r.ok === false ? "bg-ember-100/60 dark:bg-ember-700/30" : ""}>
            <Td className="font-mono">{r.second}</Td>
            <Td className="font-mono">{r.symbols}</Td>
            <Td>{r.field}</Td>
            <Td>
              <StatusBadge ok={r.ok} />
            </Td>
          </tr>
        ))}
      </DataTable>
    </div>
  );
}
