import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader, Panel } from "@/components/ui/surface";
import { requirePageUser } from "@/lib/auth/guard";

export const metadata: Metadata = { title: "Tools" };

const TOOLS = [
  { slug: "travel", name: "Drive train", text: "Encoder counts for a door's travel from spool, cord, gearbox and encoder; travel time from motor speed." },
  { slug: "stall", name: "Stall check", text: "Stall threshold and window from a nominal velocity, with the distance a door moves before it stops on an obstacle." },
  { slug: "debounce", name: "Debounce", text: "RC and Schmitt-trigger delays for buttons and end-stop contacts, and software sampling advice." },
  { slug: "sun", name: "Sun and dusk", text: "Sunrise, sunset, civil dawn and civil dusk for a site through the year, daylight-saving aware." },
  { slug: "timecode", name: "Time codes", text: "Encode and decode DCF77, MSF and WWVB minute frames; diagnose a controller's reception from its pulse log." },
];

export default async function ToolsPage() {
  await requirePageUser("tools:use");
  return (
    <>
      <PageHeader title="Tools" intro="The calculations behind every profile. The safety rules and calibration suggestions use the same functions, and each is also an HTTP route under /api/v1/tools and a command: npm run roostline -- help." />
      <ul className="grid gap-4 sm:grid-cols-2">
        {TOOLS.map((t) => (
          <li key={t.name}>
            <Link href={`/tools/${t.slug}`} className="block h-full text-inherit no-underline hover:no-underline dark:text-inherit">
              <Panel className="h-full transition-colors hover:border-dusk-300 dark:hover:border-dusk-600">
                <h2 className="font-semibold text-dusk-700 dark:text-dusk-200">{t.name}</h2>
                <p className="mt-1 text-sm text-loam-600 dark:text-loam-400">{t.text}</p>
              </Panel>
            </Link>
          </li>
        ))}
      </ul>
    </>
  );
}
