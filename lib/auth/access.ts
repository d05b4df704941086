import { createAccessControl } from "better-auth/plugins/access";
import { defaultStatements } from "better-auth/plugins/admin/access";

// better-auth's own admin endpoints check these; Roostline's guard uses lib/auth/permissions.ts.
// Every role is declared so that better-auth refuses any other role string.
export const ac = createAccessControl(defaultStatements);

const none = ac.newRole({ user: [], session: [] });

export const authRoles = {
  // No impersonation: every change must carry its real author.
  admin: ac.newRole({
    user: ["create", "list", "set-role", "ban", "get", "update", "set-password"],
    session: ["list", "revoke", "delete"],
  }),
  engineer: none,
  reviewer: none,
  technician: none,
  viewer: none,
};
