// Sign-in attempts are limited per client address across every app instance: the counts live in
// the database, so a second instance gives a guesser no second allowance.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, ensureServices, query, startApp, stopApp } from "./support";

const C = 3103;
const D = 3104;

async function badSignIn(port: number, ip: string) {
  const res = await fetch(`${baseUrl(port)}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: baseUrl(port), "x-forwarded-for": ip },
    body: JSON.stringify({ email: "admin@hollowmere.example", password: "not-the-password" }),
  });
  await res.text();
  return res;
}

describe("sign-in rate limit with two instances", () => {
  beforeAll(async () => {
    await ensureServices();
    await Promise.all([startApp(C, { freshLog: true, env: { AUTH_RATE_LIMIT: "on" } }), startApp(D, { freshLog: true, env: { AUTH_RATE_LIMIT: "on" } })]);
  });
  afterAll(async () => {
    await Promise.all([stopApp(C), stopApp(D)]);
  });

  it("refuses the sixth attempt in ten seconds with 429, wherever it lands", async () => {
    const ip = `203.0.113.${Math.floor(Math.random() * 200) + 1}`;
    const statuses: number[] = [];
    for (const port of [C, D, C, D, C]) statuses.push((await badSignIn(port, ip)).status);
    expect(statuses).toEqual([401, 401, 401, 401, 401]);
    const sixth = await badSignIn(D, ip);
    expect(sixth.status).toBe(429);
    expect(Number(sixth.headers.get("x-retry-after") ?? sixth.headers.get("retry-after"))).toBeGreaterThan(0);
    const rows = await query<{ n: number }>("SELECT COUNT(*) AS n FROM rate_limits WHERE `key` LIKE ?", [`%${ip}%`]);
    expect(Number(rows[0]!.n)).toBeGreaterThan(0);
  });

  it("still lets another address sign in meanwhile", async () => {
    const res = await badSignIn(C, "198.51.100.7");
    expect(res.status).toBe(401);
  });
});
