// Shared shapes for the three long-wave time codes.

export const STANDARDS = ["dcf77", "msf", "wwvb"] as const;
export type Standard = (typeof STANDARDS)[number];

/** One parity or consistency check of a decoded frame; `positions` are the seconds it covers. */
export type Check = { id: string; label: string; ok: boolean; detail: string; positions: number[] };

/** One second of a frame for the bit table: what was received and what it means. */
export type BitRow = { second: number; symbols: string; field: string; ok: boolean | null };

export type Zone = "CET" | "CEST" | "GMT" | "BST" | "UTC";

/** The minute a frame names, as civil fields and as ISO-8601 (local with offset, and UTC). */
export type DecodedInstant = {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  zone: Zone | null;
  /** e.g. "2026-03-29T03:00:00+02:00"; null when a field is out of range. */
  local: string | null;
  /** e.g. "2026-03-29T01:00:00Z"; null when the zone is unknown or a field is out of range. */
  utc: string | null;
};

export type FrameFlags = {
  callBit?: boolean;
  zoneChangeAnnounced?: boolean;
  leapSecondAnnounced?: boolean;
  summerTimeWarning?: boolean;
  leapYear?: boolean;
  dut1Seconds?: number | null;
  dst?: "standard time" | "DST begins today" | "DST in effect" | "DST ends today";
};

/** The result of decoding one minute frame. */
export type FrameDecode = {
  standard: Standard;
  ok: boolean;
  instant: DecodedInstant;
  /** When the frame names the following minute (DCF77, MSF) it was sent during the minute before. */
  names: "following minute" | "current minute";
  flags: FrameFlags;
  checks: Check[];
  rows: BitRow[];
};

/** Options a transmitter sets that cannot be derived from the time alone. */
export type EncodeOptions = {
  /** UT1 − UTC in seconds, −0.9…+0.9 in steps of 0.1 (MSF, WWVB). */
  dut1?: number;
  /** A leap second is due at the end of this hour (DCF77) or month (WWVB). */
  leapSecondWarning?: boolean;
  /** DCF77 call bit (abnormal transmitter operation). */
  callBit?: boolean;
};

/** An encoded frame: DCF77 and WWVB have one bit string, MSF has A and B. */
export type EncodedFrame = {
  standard: Standard;
  /** The minute the frame names, UTC. */
  utc: string;
  /** Start of the minute during which the frame is transmitted, UTC. */
  sentFrom: string;
  bits?: string;
  bitsA?: string;
  bitsB?: string;
};

export const MINUTE_MS = 60_000;
