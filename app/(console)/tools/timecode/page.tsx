import type { Metadata } from "next";
import { TimecodeTool } from "@/components/tools/timecode-tool";
import { PageHeader } from "@/components/ui/surface";
import { requirePageUser } from "@/lib/auth/guard";

export const metadata: Metadata = { title: "Time codes" };

export default async function TimecodeToolPage() {
  await requirePageUser("tools:use");
  // Start from the current minute so the first frame shown is today's.
  const now = new Date(Math.floor(Date.now() / 60_000) * 60_000).toISOString().slice(0, 16) + "Z";
  return (
    <>
      <PageHeader
        title="Time codes"
        intro="Encode and decode DCF77, MSF and WWVB minute frames with every parity and consistency check, find how far a site is from the transmitter, and diagnose a controller's reception from its pulse log."
      />
      <TimecodeTool initialTime={now} />
    </>
  );
}
