// Shapes shared by the safety rules: what a check is given, and what it reports.
import type { DoorParamsV2 } from "../schemas";

export type Decoding = "x1" | "x2" | "x4";

export type DoorModel = {
  doorTravelMm: number;
  spoolDiameterMm: number;
  cordDiameterMm: number;
  gearboxRatio: number;
  encoderPulsesPerRev: number;
  encoderDecoding: Decoding;
  motorNoLoadRpm: number;
};

export type Calibration = { fullTravelCounts: number; nominalVelocityCps: number; travelTimeMs: number };

export type Site = { latitude: number; longitude: number; timeZone: string };

export type SafetyContext = {
  /** Passed in, never read from the system clock. */
  now: Date;
  /** Where the controller runs. */
  site?: Site;
  doorModel?: DoorModel;
  /** From a calibration run on the door, when there has been one. */
  calibration?: Calibration;
  /** The year to check the schedule over; defaults to now's year in the site's zone. */
  year?: number;
};

export type Severity = "error" | "warning";

export type SafetyFinding = {
  ruleId: string;
  /** An error blocks approval; a warning needs an acknowledgement with a reason. */
  severity: Severity;
  /** JSON Pointers into the document, in the version that was checked. */
  paths: string[];
  title: string;
  /** Plain language, with the numbers. */
  message: string;
  detail?: unknown;
};

export type SafetyRule = {
  id: string;
  /** The most severe finding the rule can report; some rules also report warnings. */
  severity: Severity;
  title: string;
  /** Plain words, for a help page. */
  explanation: string;
  /** Version 2 paths the rule looks at. */
  paths: string[];
};

/** What a rule sees: the document in version 2 and the context with its year settled. */
export type RuleInput = { doc: DoorParamsV2; ctx: SafetyContext; year: number };

export type RuleCheck = (input: RuleInput) => SafetyFinding[];
