import type { Metadata } from "next";
import { Code, HelpPageHeader, HelpSection } from "@/components/help/help-page";
import { ParameterGroupSection } from "@/components/help/parameter-entry";
import { DataTable, Td } from "@/components/ui/surface";
import { getSafetyApprovals } from "@/db/queries/reviews";
import { requirePageUser } from "@/lib/auth/guard";
import { parameterGroups, versionOneRows, versionTwoOnly } from "@/lib/help/parameter-help";
import { getSchema } from "@/lib/profiles/schemas";

export const metadata: Metadata = { title: "Help: parameters" };

export default async function ParametersHelpPage() {
  await requirePageUser("dashboard:read");
  const safetyApprovals = await getSafetyApprovals();
  const groups = parameterGroups();
  const v1 = versionOneRows();
  const v2Only = versionTwoOnly();
  const schema = getSchema(2).schema;
  return (
    <>
      <HelpPageHeader
        title="Parameters"
        intro={
          <>
            Every parameter of parameter set 2, the current one, grouped as in its schema. Titles, descriptions, units, limits and defaults are the schema&apos;s own;
            typical values are marked where the trade has a usual choice. Overlays list only what differs from the layer beneath: base ← site ← controller.
          </>
        }
        toc={[...groups.map((g) => ({ id: g.anchor, label: g.title })), { id: "version-1", label: "Version 1" }]}
      />
      <p className="max-w-3xl text-sm text-loam-600 dark:text-loam-400">{String(schema.description ?? "")}</p>
      {groups.map((g) => (
        <ParameterGroupSection key={g.id} group={g} safetyApprovals={safetyApprovals} />
      ))}
      <HelpSection id="version-1" title="Version 1">
        <p>
          Parameter set 1 holds the same settings in a flat layout. Profiles still on version 1 are checked by the same safety rules (their findings name version 1 paths), and
          an engineer can migrate a profile to version 2 from its page. Migration moves each value to its new place; parameters new in version 2 take their default:
        </p>
        <ul className="list-disc pl-5">
          {v2Only.map((p) => (
            <li key={p.path}>
              <a href={`#${p.anchor}`}>{p.title}</a> (<Code>{p.path}</Code>)
            </li>
          ))}
        </ul>
        <p>Each controller is registered with the parameter set its firmware runs, and a release is refused while any controller it covers runs the other set.</p>
        <DataTable caption="Version 1 parameters and where they are in version 2" headers={["Version 1", "Version 2", "Differs"]}>
          {v1.map((r) => (
            <tr key={r.v1Path} id={r.anchor} className="scroll-mt-4">
              <Td>
                <Code>{r.v1Path}</Code>
                <span className="block text-xs text-loam-600 dark:text-loam-400">{r.title}</span>
              </Td>
              <Td>{r.v2Path && r.v2Anchor ? <a href={`#${r.v2Anchor}`}><Code>{r.v2Path}</Code></a> : "—"}</Td>
              <Td className="text-xs">{r.differences.length ? r.differences.join("; ") : "same"}</Td>
            </tr>
          ))}
        </DataTable>
      </HelpSection>
    </>
  );
}
