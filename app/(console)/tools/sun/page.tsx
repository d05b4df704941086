import type { Metadata } from "next";
import { SunTool } from "@/components/tools/sun-tool";
import { PageHeader } from "@/components/ui/surface";
import { requirePageUser } from "@/lib/auth/guard";
import { isoDate, wallTime } from "@/lib/sun/time-zone";

export const metadata: Metadata = { title: "Sun and dusk" };

const DEFAULT_SITE = { lat: "52.20", lon: "0.12", tz: "Europe/London" };

export default async function SunToolPage() {
  await requirePageUser("tools:use");
  const today = isoDate(wallTime(Date.now(), DEFAULT_SITE.tz));
  return (
    <>
      <PageHeader
        title="Sun and dusk"
        intro="Civil dawn, sunrise, sunset and civil dusk for a site on any day, and the whole year at a glance, in the site's local clock time with daylight saving."
      />
      <SunTool initial={{ ...DEFAULT_SITE, date: today }} />
    </>
  );
}
