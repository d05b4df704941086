import { hasPermission, type Permission } from "@/lib/auth/permissions";

export type NavItem = { href: string; label: string; permission: Permission; description: string };

/** The console's areas, in menu order, each with the permission that shows it. */
export const NAV_ITEMS: NavItem[] = [
  { href: "/", label: "Overview", permission: "dashboard:read", description: "What needs attention today" },
  { href: "/profiles", label: "Profiles", permission: "profiles:read", description: "Door models and their parameter profiles" },
  { href: "/reviews", label: "Reviews", permission: "reviews:decide", description: "Changes waiting for a decision" },
  { href: "/controllers", label: "Controllers", permission: "controllers:read", description: "Installed door controllers" },
  { href: "/releases", label: "Releases", permission: "controllers:read", description: "Approved revisions on their way to controllers" },
  { href: "/sites", label: "Sites", permission: "sites:read", description: "Farms and houses where doors run" },
  { href: "/tools", label: "Tools", permission: "tools:use", description: "Drive, stall, debounce, sun and time-code calculators" },
  { href: "/help", label: "Help", permission: "dashboard:read", description: "Every parameter and safety rule in plain words, with cautions" },
  { href: "/audit", label: "Audit", permission: "audit:read", description: "Who changed what, and when" },
  { href: "/admin/users", label: "People", permission: "users:manage", description: "Invite colleagues and set their roles" },
  { href: "/admin/mail", label: "Mail", permission: "mail:read", description: "Outgoing mail and the local capture" },
  { href: "/admin/settings", label: "Settings", permission: "settings:manage", description: "Team rules such as approvals for safety changes" },
];

/** The navigation a role may see. */
export function navFor(role: string): NavItem[] {
  return NAV_ITEMS.filter((item) => hasPermission(role, item.permission));
}
