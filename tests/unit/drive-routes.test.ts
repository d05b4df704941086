import { describe, expect, it } from "vitest";
import { GET as debounceGet } from "@/app/api/v1/tools/debounce/route";
import { GET as stallGet } from "@/app/api/v1/tools/stall/route";
import { GET as travelGet } from "@/app/api/v1/tools/travel/route";

const call = (get: typeof travelGet, path: string) => get(new Request(`http://127.0.0.1${path}`), undefined);

describe("GET /api/v1/tools/travel", () => {
  it("returns the counts for the travel, cacheable", async () => {
    const res = await call(travelGet, "/api/v1/tools/travel?travelMm=300&spoolMm=20&cordMm=2&gearRatio=30&ppr=12&decoding=4&motorRpm=2000");
    expect(res.status).toBe(200);
    expect(res.headers.get("cache-control")).toBe("public, max-age=300");
    const body = await res.json();
    expect(body.result.countsRounded).toBe(6250);
    expect(body.result.atMotorRpm.travelTimeS).toBeCloseTo(3.9065, 3);
  });

  it("answers 400 naming the field for a zero spool", async () => {
    const res = await call(travelGet, "/api/v1/tools/travel?travelMm=300&spoolMm=0&gearRatio=30&ppr=12");
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.error).toBe("invalid_request");
    expect(body.issues).toContainEqual({ path: "/spoolMm", message: "must be greater than 0" });
  });

  it("answers 400 for a decoding not in 1, 2, 4 and for an unknown parameter", async () => {
    const bad = await (await call(travelGet, "/api/v1/tools/travel?travelMm=300&spoolMm=20&gearRatio=30&ppr=12&decoding=3")).json();
    expect(bad.issues).toContainEqual({ path: "/decoding", message: "must be 1, 2 or 4" });
    const unknown = await call(travelGet, "/api/v1/tools/travel?travelMm=300&spoolMm=20&gearRatio=30&ppr=12&gear=3");
    expect(unknown.status).toBe(400);
  });
});

describe("GET /api/v1/tools/stall", () => {
  it("returns the threshold and the caution", async () => {
    const res = await call(stallGet, "/api/v1/tools/stall?nominalCps=2400&fraction=0.5&windowMs=50");
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.result.thresholdCountsPerWindow).toBeCloseTo(60, 9);
    expect(body.caution).toContain("second line of defence");
  });

  it("answers 400 naming a fraction outside (0, 1)", async () => {
    const res = await call(stallGet, "/api/v1/tools/stall?nominalCps=2400&fraction=0&windowMs=50");
    expect(res.status).toBe(400);
    expect((await res.json()).issues).toContainEqual({ path: "/fraction", message: "must be greater than 0" });
  });
});

describe("GET /api/v1/tools/debounce", () => {
  it("returns both delays from engineering notation", async () => {
    const res = await call(debounceGet, "/api/v1/tools/debounce?r1Ohm=10k&r2Ohm=10k&cFarad=1u&vcc=5&vtPlus=3&vtMinus=1.5");
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.result.closeDelayS).toBeCloseTo(0.0120397, 7);
    expect(body.result.openDelayS).toBeCloseTo(0.0183258, 7);
  });

  it("answers 400 naming thresholds out of order and non-numeric fields", async () => {
    const res = await call(debounceGet, "/api/v1/tools/debounce?r1Ohm=ten&r2Ohm=10k&cFarad=1u&vcc=5&vtPlus=3&vtMinus=1.5");
    expect(res.status).toBe(400);
    expect((await res.json()).issues).toContainEqual({ path: "/r1Ohm", message: "must be a number" });
    const order = await call(debounceGet, "/api/v1/tools/debounce?r1Ohm=10k&r2Ohm=10k&cFarad=1u&vcc=5&vtPlus=6&vtMinus=1.5");
    expect((await order.json()).issues).toContainEqual({ path: "/vtPlus", message: "must be below Vcc" });
  });
});
