import { Badge, DataTable, Td } from "@/components/ui/surface";
import { leafEntries, type JsonValue } from "@/lib/profiles/json";
import { mergeLayers, type LayerName } from "@/lib/profiles/merge";
import { findParameter } from "@/lib/profiles/parameter-info";
import type { ParamsVersion } from "@/lib/profiles/schemas";

const LAYER_LABEL: Record<LayerName, string> = { base: "base", site: "site overlay", controller: "controller overlay" };

/** The effective configuration (base ← overlay) with the layer that set each parameter. */
export function EffectiveTable({ version, layers, merged }: { version: ParamsVersion; layers?: { layer: LayerName; values: object }[]; merged?: { values: object; provenance: Record<string, LayerName> } }) {
  const { values, provenance } = (merged ?? mergeLayers(layers ?? [])) as { values: Record<string, unknown>; provenance: Record<string, LayerName> };
  const kind = (values.schedule as { kind?: string } | undefined)?.kind ?? null;
  const rows = leafEntries(values as JsonValue);
  return (
    <DataTable caption="Effective configuration" headers={["Parameter", "Value", "Set by"]}>
      {rows.map(([path, value]) => {
        const info = findParameter(version, path, kind);
        const layer = provenance[path] ?? "base";
        return (
          <tr key={path}>
            <Td>
              {info?.title ?? path}
              <code className="block font-mono text-xs text-loam-600 dark:text-loam-400">{path}</code>
            </Td>
            <Td className="font-mono text-xs">
              {typeof value === "string" ? value : JSON.stringify(value)} {info?.unit ?? ""}
            </Td>
            <Td>
              <Badge tone={layer === "base" ? "neutral" : "info"}>{LAYER_LABEL[layer]}</Badge>
            </Td>
          </tr>
        );
      })}
    </DataTable>
  );
}
