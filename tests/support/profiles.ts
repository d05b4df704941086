// Test data for profiles: a fresh door model per test, and a valid version 2 document for it.
import { randomBytes } from "node:crypto";
import { db } from "@/db/client";
import { doorModels } from "@/db/schema";
import { withCookie } from "./auth";
import base from "@/tests/fixtures/profiles/v2-base-henhouse-350.json";

/** A door model with a unique code, the drive train the v2 fixture was computed for. */
export async function createDoorModel() {
  const code = `T-${randomBytes(4).toString("hex")}`;
  const [row] = await db
    .insert(doorModels)
    .values({ code, name: `Test door ${code}`, doorWidthMm: 350, doorTravelMm: 420, spoolDiameterMm: 50, cordDiameterMm: 1.5, gearboxRatio: 100, encoderPulsesPerRev: 16, encoderDecoding: "x4", motorNoLoadRpm: 5000 })
    .$returningId();
  return { id: row!.id, code };
}

/** A schema-valid version 2 base document whose schedule sits on its step grid. */
export function baseDocument(overrides: Record<string, unknown> = {}): Record<string, unknown> {
  const doc = structuredClone(base) as Record<string, unknown>;
  doc.schedule = { kind: "sun", sunriseOffsetMinutes: 30, civilDuskOffsetMinutes: 30, stepMinutes: 30 };
  // 50 % of the ~4,000 counts/s this drive turns at, and ~2.7 × its travel time: no safety error.
  doc.stall = { thresholdCps: 2000, windowMs: 100, startupBlankingMs: 300, reopenOnStall: true };
  doc.travelTimeoutMs = 12000;
  return { ...doc, ...overrides };
}

const BASE = "http://127.0.0.1:3100";

/** A JSON request with a session cookie. */
export function jsonRequest(path: string, cookie: string | null, method: string, body?: unknown): Request {
  const headers = cookie ? withCookie(cookie, { "content-type": "application/json" }) : new Headers({ "content-type": "application/json" });
  return new Request(`${BASE}${path}`, { method, headers, body: body === undefined ? undefined : typeof body === "string" ? body : JSON.stringify(body) });
}

export const params = <K extends string>(key: K, value: number | string) => ({ params: Promise.resolve({ [key]: String(value) } as Record<K, string>) });
