import { describe, expect, it } from "vitest";
import { hasPermission, isRole, PERMISSIONS, permissionsOf, ROLES } from "@/lib/auth/permissions";
import { navFor, NAV_ITEMS } from "@/lib/nav";

describe("role → permission table", () => {
  it("gives admins every permission", () => {
    expect(permissionsOf("admin")).toEqual([...PERMISSIONS]);
  });

  it("lets only engineers and admins edit profiles", () => {
    expect(ROLES.filter((r) => hasPermission(r, "profiles:edit"))).toEqual(["admin", "engineer"]);
  });

  it("lets only reviewers and admins decide reviews", () => {
    expect(ROLES.filter((r) => hasPermission(r, "reviews:decide"))).toEqual(["admin", "reviewer"]);
  });

  it("lets only technicians and admins register controllers and upload calibration runs", () => {
    expect(ROLES.filter((r) => hasPermission(r, "controllers:manage"))).toEqual(["admin", "technician"]);
    expect(ROLES.filter((r) => hasPermission(r, "calibrations:upload"))).toEqual(["admin", "technician"]);
  });

  it("keeps people, device tokens, releases and mail with admins alone", () => {
    for (const p of ["users:manage", "tokens:manage", "releases:manage", "mail:read", "settings:manage"] as const) {
      expect(ROLES.filter((r) => hasPermission(r, p))).toEqual(["admin"]);
    }
  });

  it("lets viewers read but change nothing", () => {
    const viewer = permissionsOf("viewer");
    expect(viewer).toContain("profiles:read");
    expect(viewer.every((p) => p.endsWith(":read") || p === "tools:use")).toBe(true);
  });

  it("gives every role the read permissions", () => {
    for (const r of ROLES) {
      for (const p of ["dashboard:read", "profiles:read", "controllers:read", "sites:read", "tools:use"] as const) {
        expect(hasPermission(r, p)).toBe(true);
      }
    }
  });

  it("grants nothing to unknown, empty or missing roles", () => {
    for (const role of ["", "root", "Admin", null, undefined, "user"]) {
      expect(isRole(role)).toBe(false);
      expect(PERMISSIONS.some((p) => hasPermission(role, p))).toBe(false);
    }
  });
});

describe("navigation by role", () => {
  it("shows each area only to roles holding its permission", () => {
    for (const r of ROLES) {
      const labels = navFor(r).map((n) => n.label);
      const expected = NAV_ITEMS.filter((n) => hasPermission(r, n.permission)).map((n) => n.label);
      expect(labels).toEqual(expected);
    }
  });

  it("shows People and Mail to admins only", () => {
    expect(navFor("admin").map((n) => n.label)).toEqual(expect.arrayContaining(["People", "Mail"]));
    for (const r of ROLES.filter((x) => x !== "admin")) {
      expect(navFor(r).map((n) => n.label)).not.toContain("People");
      expect(navFor(r).map((n) => n.label)).not.toContain("Mail");
    }
  });

  it("shows the viewer the reading areas and nothing else", () => {
    expect(navFor("viewer").map((n) => n.label)).toEqual(["Overview", "Profiles", "Controllers", "Releases", "Sites", "Tools", "Help"]);
  });
});
