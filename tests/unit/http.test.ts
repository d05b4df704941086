import { describe, expect, it } from "vitest";
import { z } from "zod";
import { safeNextPath } from "@/lib/auth/safe-redirect";
import { AppError, isDatabaseUnavailable, toAppError } from "@/lib/http/errors";
import { errorResponse, handle, readJson } from "@/lib/http/route";

const jsonRequest = (body: string, type = "application/json") =>
  new Request("http://127.0.0.1/x", { method: "POST", headers: { "content-type": type }, body });

describe("readJson", () => {
  it("refuses a body without a length as soon as too much has arrived, without reading the rest", async () => {
    let pulled = 0;
    const chunk = new Uint8Array(10 * 1024).fill(32);
    const body = new ReadableStream<Uint8Array>({
      pull(controller) {
        pulled++;
        if (pulled > 1000) controller.close();
        else controller.enqueue(chunk);
      },
    });
    const request = new Request("http://x/y", { method: "POST", headers: { "content-type": "application/json" }, body, duplex: "half" } as RequestInit);
    const err = await readJson(request, z.object({})).catch((e) => e);
    expect(err).toBeInstanceOf(AppError);
    expect(err.message).toContain("larger than 256 KiB");
    expect(pulled).toBeLessThan(40);
  });


  const schema = z.object({ n: z.number() });

  it("accepts a well-formed body", async () => {
    await expect(readJson(jsonRequest('{"n":1}'), schema)).resolves.toEqual({ n: 1 });
  });

  it("refuses malformed JSON with a 400 that says so", async () => {
    const err = await readJson(jsonRequest("{n:"), schema).catch((e) => e);
    expect(err).toBeInstanceOf(AppError);
    expect(err.status).toBe(400);
    expect(err.message).toMatch(/not valid JSON/);
  });

  it("refuses another content type", async () => {
    const err = await readJson(jsonRequest('{"n":1}', "text/plain"), schema).catch((e) => e);
    expect(err.status).toBe(400);
  });

  it("names the path of a wrong field", async () => {
    const err = await readJson(jsonRequest('{"n":"one"}'), schema).catch((e) => e);
    expect(err.issues).toEqual([expect.objectContaining({ path: "/n" })]);
  });
});

describe("handle", () => {
  it("turns an AppError into its status and JSON body", async () => {
    const res = await handle(async () => {
      throw new AppError("forbidden", "no");
    })(new Request("http://127.0.0.1/x"), {});
    expect(res.status).toBe(403);
    expect(await res.json()).toEqual({ error: "forbidden", message: "no" });
  });

  it("masks unknown errors as a 500 without their text", async () => {
    const errors: unknown[] = [];
    const original = console.error;
    console.error = (...a: unknown[]) => errors.push(a);
    try {
      const res = await handle(async () => {
        throw new Error("ER_PARSE_ERROR near 'SELECT secret'");
      })(new Request("http://127.0.0.1/x"), {});
      expect(res.status).toBe(500);
      expect(await res.text()).not.toContain("SELECT");
      expect(errors.length).toBe(1);
    } finally {
      console.error = original;
    }
  });

  it("answers 503 with Retry-After when the database is unreachable (driver code on the cause)", async () => {
    const dbDown = Object.assign(new Error("Failed query"), { cause: Object.assign(new Error("connect"), { code: "ECONNREFUSED" }) });
    expect(isDatabaseUnavailable(dbDown)).toBe(true);
    const res = errorResponse(toAppError(dbDown)!);
    expect(res.status).toBe(503);
    expect(res.headers.get("retry-after")).toBe("5");
  });
});

describe("safeNextPath", () => {
  it("keeps same-site paths", () => {
    expect(safeNextPath("/admin/users?x=1")).toBe("/admin/users?x=1");
  });

  it("refuses other hosts and protocol-relative or odd values", () => {
    for (const bad of ["https://evil.test/", "//evil.test", "/\\evil.test", "javascript:alert(1)", "", null, undefined, "/sign-in?next=/x"]) {
      expect(safeNextPath(bad)).toBe("/");
    }
  });
});
