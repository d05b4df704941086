import type { Metadata } from "next";
import { PageHeader, Panel } from "@/components/ui/surface";
import { requirePageUser } from "@/lib/auth/guard";

export const metadata: Metadata = { title: "Tools" };

const TOOLS = [
  { name: "Drive train", text: "Encoder counts for a door's travel from spool, cord, gearbox and encoder; travel time from motor speed." },
  { name: "Stall check", text: "Stall threshold and window from a nominal velocity, with the distance a door moves before it stops on an obstacle." },
  { name: "Debounce", text: "RC and Schmitt-trigger delays for buttons and end-stop contacts, and software sampling advice." },
  { name: "Sun and dusk", text: "Sunrise, sunset, civil dawn and civil dusk for a site through the year, daylight-saving aware." },
  { name: "Time codes", text: "Encode and decode DCF77, MSF and WWVB minute frames; diagnose a controller's reception from its pulse log." },
];

export default async function ToolsPage() {
  await requirePageUser("tools:use");
  return (
    <>
      <PageHeader title="Tools" intro="The calculations behind every profile. The safety rules and calibration suggestions use the same functions." />
      <ul className="grid gap-4 sm:grid-cols-2">
        {TOOLS.map((t) => (
          <li key={t.name}>
            <Panel className="h-full">
              <h2 className="font-semibold">{t.name}</h2>
              <p className="mt-1 text-sm text-loam-600 dark:text-loam-400">{t.text}</p>
              <p className="mt-3 text-xs font-medium uppercase tracking-wide text-straw-700 dark:text-straw-300">Not yet available</p>
            </Panel>
          </li>
        ))}
      </ul>
    </>
  );
}
