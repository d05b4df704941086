import { describe, expect, it } from "vitest";
import { parseEnv } from "@/lib/env";

const secret = "s".repeat(32);

describe("environment", () => {
  it("needs nothing but the secret: every other value has a working default", () => {
    const env = parseEnv({ BETTER_AUTH_SECRET: secret });
    expect(env.DATABASE_URL).toMatch(/^mysql:\/\/.*127\.0\.0\.1:3317\/roostline$/);
    expect(env.APP_URL).toBe("http://127.0.0.1:3000");
    expect(env.SMTP_PORT).toBe(2525);
    expect(env.AUTH_RATE_LIMIT).toBe(true);
    expect(env.ROOSTLINE_DEMO).toBe(false);
  });

  it("refuses a missing or short secret with a message naming it", () => {
    expect(() => parseEnv({})).toThrow(/BETTER_AUTH_SECRET/);
    expect(() => parseEnv({ BETTER_AUTH_SECRET: "short" })).toThrow(/BETTER_AUTH_SECRET: must be at least 32/);
  });

  it("lists every wrong variable at once", () => {
    const err = (() => {
      try {
        parseEnv({ BETTER_AUTH_SECRET: secret, SMTP_PORT: "seventy", DATABASE_URL: "postgres://x", AUTH_RATE_LIMIT: "maybe" });
      } catch (e) {
        return String(e);
      }
    })();
    expect(err).toMatch(/SMTP_PORT/);
    expect(err).toMatch(/DATABASE_URL: must be a mysql:\/\/ URL/);
    expect(err).toMatch(/AUTH_RATE_LIMIT/);
  });

  it("reads on/off switches in their usual spellings", () => {
    for (const [raw, value] of [["on", true], ["1", true], ["true", true], ["off", false], ["0", false], ["no", false]] as const) {
      expect(parseEnv({ BETTER_AUTH_SECRET: secret, AUTH_RATE_LIMIT: raw }).AUTH_RATE_LIMIT).toBe(value);
    }
  });
});
