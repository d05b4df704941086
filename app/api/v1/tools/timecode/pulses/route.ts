import { handle, readJson } from "@/lib/http/route";
import { pulseLogInputSchema } from "@/lib/timecode/inputs";
import { decodePulseLog } from "@/lib/timecode/pulses";

/**
 * Diagnoses a receiver's pulse log: `{ standard, pulses: [{ startMs, widthMs }] }` (at most 5000
 * pulses, 256 KiB) → minute frames with decoded times and missing, extra, out-of-tolerance and
 * parity problems. Public: pure computation, touches no data.
 */
export const POST = handle(async (request: Request) => {
  const input = await readJson(request, pulseLogInputSchema);
  return Response.json(decodePulseLog(input.standard, input.pulses), { headers: { "cache-control": "public, max-age=300" } });
});
