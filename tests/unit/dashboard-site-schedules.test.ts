import { describe, expect, it } from "vitest";
import { siteSchedules } from "@/lib/dashboard/site-schedules";

const sites = [
  { id: 1, name: "Corrie Brae" },
  { id: 2, name: "Lindenhof" },
  { id: 3, name: "Empty" },
];
const released = new Map([
  ["h1", { values: { checkInIntervalS: 900 }, releaseId: 7 }],
  ["h2", { values: { checkInIntervalS: 600 }, releaseId: 8 }],
]);
const approvedBase = { checkInIntervalS: 1200 };

describe("schedules per site", () => {
  it("groups controllers by assigned configuration, falls back to the approved base, and keeps sites without controllers", () => {
    const out = siteSchedules({
      sites,
      controllers: [
        { siteId: 1, doorModelId: 10, doorModelName: "Henhouse 350", assignedHash: "h1" },
        { siteId: 1, doorModelId: 10, doorModelName: "Henhouse 350", assignedHash: "h1" },
        { siteId: 1, doorModelId: 11, doorModelName: "Hatchling 220", assignedHash: null },
        { siteId: 2, doorModelId: 10, doorModelName: "Henhouse 350", assignedHash: "h2" },
        { siteId: 2, doorModelId: 12, doorModelName: "Gooseway 500", assignedHash: null },
        { siteId: 2, doorModelId: 10, doorModelName: "Henhouse 350", assignedHash: "unknown" },
      ],
      released,
      approved: (doorModelId) => (doorModelId === 10 || doorModelId === 11 ? approvedBase : null),
    });
    expect(out.map((s) => s.site.name)).toEqual(["Corrie Brae", "Lindenhof", "Empty"]);
    expect(out[0]!.groups).toEqual([
      { key: "h:h1", source: { kind: "release", releaseId: 7 }, controllers: 2, values: { checkInIntervalS: 900 } },
      { key: "m:11", source: { kind: "approved", doorModelName: "Hatchling 220" }, controllers: 1, values: approvedBase },
    ]);
    expect(out[1]!.groups.map((g) => [g.key, g.source.kind, g.controllers])).toEqual([
      ["h:h2", "release", 1],
      ["m:10", "approved", 1],
      ["m:12", "none", 1],
    ]);
    expect(out[2]!.groups).toEqual([]);
  });
});
