// The seeded demo accounts, one per role (the seed's second reviewer is left out).
import { demoUsers } from "@/db/seed/demo";
import { ROLES, type Role } from "@/lib/auth/permissions";

export type DemoUser = (typeof demoUsers)[number];

export function demoUser(role: Role): DemoUser {
  const user = demoUsers.find((u) => u.role === role);
  if (!user) throw new Error(`the seed has no ${role}`);
  return user;
}

export const DEMO_ROLES = ROLES;
