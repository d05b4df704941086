import { handle } from "@/lib/http/route";
import { parseWith } from "@/lib/http/validation";
import { decodeFrame, encodeFrame } from "@/lib/timecode/frames";
import { decodeInputSchema, distanceInputSchema, encodeInputSchema, timecodeActionSchema } from "@/lib/timecode/inputs";
import { transmitterDistance } from "@/lib/timecode/transmitters";

const HEADERS = { "cache-control": "public, max-age=300" };

/**
 * Time-code frames. `?action=encode&standard=&time=` (ISO-8601 with offset; optional dut1,
 * leapSecondWarning, callBit) → the bit string(s) naming that minute; `?action=decode&standard=&bits=`
 * (or bitsA and bitsB for MSF) → the decoded minute with every check; `?action=distance&standard=&lat=&lon=`
 * → distance and bearing to the transmitter. Public: pure computation, touches no data.
 */
export const GET = handle(async (request: Request) => {
  const query = Object.fromEntries(new URL(request.url).searchParams);
  const { action } = parseWith(timecodeActionSchema, query, "query");
  if (action === "encode") {
    const input = parseWith(encodeInputSchema, query, "query");
    return Response.json(encodeFrame(input.standard, input.time, input), { headers: HEADERS });
  }
  if (action === "decode") {
    return Response.json(decodeFrame(parseWith(decodeInputSchema, query, "query")), { headers: HEADERS });
  }
  const input = parseWith(distanceInputSchema, query, "query");
  return Response.json(transmitterDistance(input.standard, input), { headers: HEADERS });
});
