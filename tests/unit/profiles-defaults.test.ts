import { describe, expect, it } from "vitest";
import { defaultDocument } from "@/lib/profiles/defaults";
import { validateParams } from "@/lib/profiles/schemas";

describe("default documents", () => {
  it.each([1, 2] as const)("builds a version %i document that passes its own schema", (version) => {
    const doc = defaultDocument(version);
    expect(doc.parameterSetVersion).toBe(version);
    expect(validateParams(version, doc).issues).toEqual([]);
  });
});
