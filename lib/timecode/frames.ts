// One entry point per operation for the three codes, so faces need not branch on the standard.
import { decodeDcf77, encodeDcf77 } from "./dcf77";
import { decodeMsf, encodeMsf } from "./msf";
import type { EncodeOptions, EncodedFrame, FrameDecode, FrameFlags, Standard } from "./types";
import { decodeWwvb, encodeWwvb } from "./wwvb";

/** Encodes the frame that names the minute containing `atMs` (UTC ms). */
export function encodeFrame(standard: Standard, atMs: number, opts: EncodeOptions = {}): EncodedFrame {
  if (standard === "dcf77") return encodeDcf77(atMs, opts);
  if (standard === "msf") return encodeMsf(atMs, opts);
  return encodeWwvb(atMs, opts);
}

/** Decodes a frame: `bits` for DCF77 and WWVB, `bitsA` and `bitsB` for MSF. */
export function decodeFrame(input: { standard: Standard; bits?: string; bitsA?: string; bitsB?: string }): FrameDecode {
  if (input.standard === "dcf77") return decodeDcf77(input.bits ?? "");
  if (input.standard === "msf") return decodeMsf(input.bitsA ?? "", input.bitsB ?? "");
  return decodeWwvb(input.bits ?? "");
}

/** Human names of the codes. */
export const STANDARD_LABELS: Record<Standard, string> = { dcf77: "DCF77 (Germany)", msf: "MSF (United Kingdom)", wwvb: "WWVB (United States)" };

/** A frame's flags in words, for people ("leap second announced", "DUT1 −0.2 s"). */
export function describeFlags(flags: FrameFlags): string[] {
  const out: string[] = [];
  if (flags.callBit) out.push("call bit set (abnormal transmitter operation)");
  if (flags.zoneChangeAnnounced) out.push("CET/CEST change announced");
  if (flags.summerTimeWarning) out.push("change to or from BST imminent");
  if (flags.leapSecondAnnounced) out.push("leap second announced");
  if (flags.leapYear !== undefined) out.push(flags.leapYear ? "leap year" : "not a leap year");
  if (flags.dut1Seconds !== undefined) out.push(flags.dut1Seconds === null ? "DUT1 unreadable" : `DUT1 ${flags.dut1Seconds >= 0 ? "+" : "−"}${Math.abs(flags.dut1Seconds).toFixed(1)} s`);
  if (flags.dst) out.push(`US ${flags.dst}`);
  return out;
}
