import { describe, expect, it } from "vitest";
import { csvField, toCsv } from "@/lib/audit/csv";

// Quoting rules from RFC 4180, "Common Format and MIME Type for CSV Files", section 2.
describe("CSV export", () => {
  it("quotes fields with commas, quotes and line breaks, doubling quotes (RFC 4180 §2.6–2.7)", () => {
    expect(csvField("a,b")).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField("two\nlines")).toBe('"two\nlines"');
    expect(csvField("plain")).toBe("plain");
  });

  it("ends every record with CRLF (RFC 4180 §2.1)", () => {
    expect(toCsv(["a", "b"], [[1, null]])).toBe("a,b\r\n1,\r\n");
  });

  it("disarms values a spreadsheet would run as formulas (common practice)", () => {
    expect(csvField("=HYPERLINK(1)")).toBe("'=HYPERLINK(1)");
    expect(csvField("-3")).toBe("'-3");
  });

  it("writes dates as ISO-8601 and objects as JSON", () => {
    expect(csvField(new Date("2026-12-02T01:00:00Z"))).toBe("2026-12-02T01:00:00.000Z");
    expect(csvField({ from: "viewer" })).toBe('"{""from"":""viewer""}"');
  });
});
