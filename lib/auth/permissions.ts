// Roostline's one role → permission table. Pure: no I/O, imported by server and client code alike.

export const ROLES = ["admin", "engineer", "reviewer", "technician", "viewer"] as const;
export type Role = (typeof ROLES)[number];

export const PERMISSIONS = [
  "dashboard:read",
  "profiles:read",
  "profiles:edit",
  "reviews:decide",
  "reviews:comment",
  "controllers:read",
  "controllers:manage",
  "calibrations:upload",
  "sites:read",
  "sites:manage",
  "tools:use",
  "audit:read",
  "users:manage",
  "tokens:manage",
  "releases:manage",
  "mail:read",
  "settings:manage",
] as const;
export type Permission = (typeof PERMISSIONS)[number];

const READ: Permission[] = ["dashboard:read", "profiles:read", "controllers:read", "sites:read", "tools:use"];

const TABLE: Record<Role, readonly Permission[]> = {
  viewer: READ,
  engineer: [...READ, "profiles:edit", "reviews:comment"],
  reviewer: [...READ, "reviews:decide", "reviews:comment", "audit:read"],
  technician: [...READ, "controllers:manage", "calibrations:upload", "sites:manage"],
  admin: PERMISSIONS,
};

export const ROLE_LABELS: Record<Role, string> = {
  admin: "Admin",
  engineer: "Engineer",
  reviewer: "Reviewer",
  technician: "Technician",
  viewer: "Viewer",
};

export const ROLE_SUMMARIES: Record<Role, string> = {
  admin: "Manages people, device tokens and releases; can do everything below.",
  engineer: "Writes and tunes parameter profiles and submits them for review.",
  reviewer: "Checks submitted changes against the schema and safety rules, then approves or sends back.",
  technician: "Registers sites and controllers and uploads calibration runs from the field.",
  viewer: "Reads profiles, controllers, sites and tools; changes nothing.",
};

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}

/** Whether a role holds a permission; unknown roles hold none. */
export function hasPermission(role: string | null | undefined, permission: Permission): boolean {
  if (!isRole(role)) return false;
  return TABLE[role].includes(permission);
}

/** Every permission of a role, in table order. */
export function permissionsOf(role: string | null | undefined): Permission[] {
  return isRole(role) ? [...TABLE[role]] : [];
}
