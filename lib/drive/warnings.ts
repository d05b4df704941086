/** A plausibility or safety remark on a calculation; `basis` says where the limit comes from. */
export type DriveWarning = {
  code: string;
  severity: "warn" | "bad";
  message: string;
  basis: string;
};

export const COMMON_PRACTICE = "common practice";

/** The caution shown wherever a value affects trapping or injury. */
export const TRAPPING_CAUTION =
  "Stall detection is a second line of defence, not a guarantee. Follow local rules and licensed practice for powered doors where animals or people can be trapped, for mains wiring and for animal welfare.";
