// The seeded demo accounts (db/seed/demo.ts); the test database is rebuilt with them.
import type { Role } from "@/lib/auth/permissions";

export type DemoUser = { role: Role; email: string; password: string };

export const DEMO_USERS: Record<Role, DemoUser> = {
  admin: { role: "admin", email: "admin@hollowmere.example", password: "roostline-admin" },
  engineer: { role: "engineer", email: "engineer@hollowmere.example", password: "roostline-engineer" },
  reviewer: { role: "reviewer", email: "reviewer@hollowmere.example", password: "roostline-reviewer" },
  technician: { role: "technician", email: "technician@hollowmere.example", password: "roostline-technician" },
  viewer: { role: "viewer", email: "viewer@hollowmere.example", password: "roostline-viewer" },
};
