// Who may call what: every route handler and server action with the identities it lets through.
// tests/integration/authz-matrix.test.ts drives each cell against the running server and fails on any
// difference, on an endpoint missing here, and on an entry whose code is gone.
import { hasPermission, type Permission, ROLES, type Role } from "@/lib/auth/permissions";

export type Identity = "anonymous" | "device" | Role;
/** The columns: no credentials, a controller's bearer token, then a fresh signed-in user per role. */
export const IDENTITIES: readonly Identity[] = ["anonymous", "device", "viewer", "engineer", "reviewer", "technician", "admin"];

export type Expectation = "allow" | "deny";
export type Method = "GET" | "POST" | "PUT" | "PATCH" | "DELETE";

/**
 * What stands in front of the endpoint:
 * - a permission: `authorize()` / `requireUser()` with it (lib/auth/guard.ts);
 * - "signed-in": any signed-in user; "public": nobody is refused;
 * - "own-serial": a controller's bearer token for the serial in the URL (lib/auth/device.ts);
 * - "better-auth": better-auth's own checks (admin plugin roles in lib/auth/access.ts, disableSignUp);
 * - "proxy": no check of its own; only proxy.ts bounces requests without a session cookie to sign-in.
 */
export type Guard = Permission | "signed-in" | "public" | "own-serial" | "better-auth" | "proxy";

type Common = {
  guard: Guard;
  /** Identities that get through; every other identity must be refused. */
  allow: readonly Identity[];
  /**
   * A made-up session cookie and bearer token (they pass proxy.ts, which only checks that a cookie is
   * there, so they reach the endpoint's own check). Refused wherever anonymous is, unless set here.
   */
  forged?: Expectation;
  /** Further cells beyond the identity columns. */
  extra?: readonly ExtraCell[];
  note?: string;
};

export type RouteEntry = Common & {
  kind: "route";
  method: Method;
  /** The route folder under app/, e.g. "api/v1/profiles/[profileId]". */
  dir: string;
  /** The sample request's path; {placeholders} are listed in PLACEHOLDERS. */
  path: string;
  /** The sample JSON body: invalid or aimed at ids that do not exist, so an allowed call changes nothing. */
  body?: unknown;
  /** What a refusal looks like when it is not 401/403. */
  refusal?: { status: number; code: string };
};

export type ActionEntry = Common & {
  kind: "action";
  /** The "use server" file (under app/, components/ or lib/). */
  file: string;
  name: string;
  /** A console page that uses the action; the POST goes there with the Next-Action header. */
  page: string;
  /** The form fields, harmless for an allowed caller (they fail validation or name nothing real). */
  fields: Record<string, string>;
  /** Each cell gets a session of its own, because the call ends it. */
  endsSession?: boolean;
};

export type ExtraCell = {
  label: string;
  identity: Identity;
  /** Another path for a route entry. */
  path?: string;
  /** Another Origin header (the server's own by default). */
  origin?: string;
  /** Other form fields for an action entry. */
  fields?: Record<string, string>;
  /**
   * "refused": the action must not run (no ok result, no redirect, nothing created), whatever the
   * status: Next answers a cross-site action with a 500 and an error row.
   */
  expect: Expectation | "refused";
};

export type MatrixEntry = RouteEntry | ActionEntry;

/** Sample values that do not exist, for calls that would change something if they found it. */
export const MISSING = { id: 987654321, uuid: "00000000-0000-4000-8000-00000000dead", serial: "HM-0000-MISSING" } as const;

/** What the sample paths' and bodies' {placeholders} stand for; the test fills them in. */
export const PLACEHOLDERS: Record<string, string> = {
  serial: "the serial of a controller registered for this run (the device column's own)",
  otherSerial: "the serial of another controller",
  profileId: "an existing profile with at least two revisions",
  revisionId: "its newest revision",
  otherRevisionId: "its previous revision",
  siteId: "the demo site lindenhof",
  releaseId: "an existing release (or a missing id when there is none)",
  mailId: "a captured message (or a missing id when there is none)",
  userId: "a user created for this run",
  email: "a fresh e-mail address, new for every cell",
};

const SIGNED_IN: readonly Identity[] = ROLES;
const EVERYONE: readonly Identity[] = ["anonymous", "device", ...ROLES];
const DEVICE: readonly Identity[] = ["device"];
const ADMIN: readonly Identity[] = ["admin"];

/** The roles a permission grants, read from lib/auth/permissions.ts. */
export const rolesWith = (permission: Permission): Role[] => ROLES.filter((r) => hasPermission(r, permission));

const route = (method: Method, dir: string, path: string, guard: Guard, allow: readonly Identity[], more: Partial<RouteEntry> = {}): RouteEntry => ({ kind: "route", method, dir, path, guard, allow, ...more });
/** A route guarded by one permission: exactly the roles holding it get through. */
const by = (permission: Permission, method: Method, dir: string, path: string, more: Partial<RouteEntry> = {}): RouteEntry => route(method, dir, path, permission, rolesWith(permission), more);
const action = (file: string, name: string, page: string, guard: Guard, allow: readonly Identity[], fields: Record<string, string>, more: Partial<ActionEntry> = {}): ActionEntry => ({ kind: "action", file, name, page, guard, allow, fields, ...more });

export const MATRIX: readonly MatrixEntry[] = [
  // Public: pure calculations, health, the API description and the key configurations are signed with.
  route("GET", "api/v1/health", "/api/v1/health", "public", EVERYONE),
  route("GET", "api/v1/openapi.json", "/api/v1/openapi.json", "public", EVERYONE),
  route("GET", "api/v1/device/public-key", "/api/v1/device/public-key", "public", EVERYONE),
  route("GET", "api/v1/tools/travel", "/api/v1/tools/travel?travelMm=300&spoolMm=20&cordMm=2&gearRatio=30&ppr=12&decoding=4&motorRpm=2000", "public", EVERYONE),
  route("GET", "api/v1/tools/stall", "/api/v1/tools/stall?nominalCps=2400&fraction=0.5&windowMs=50", "public", EVERYONE),
  route("GET", "api/v1/tools/debounce", "/api/v1/tools/debounce?r1Ohm=10k&r2Ohm=10k&cFarad=1u&vcc=5&vtPlus=3&vtMinus=1.5", "public", EVERYONE),
  route("GET", "api/v1/tools/sun", "/api/v1/tools/sun?lat=53.1&lon=8.8&date=2026-06-21&tz=Europe/Berlin", "public", EVERYONE),
  route("GET", "api/v1/tools/timecode", "/api/v1/tools/timecode?action=encode&standard=dcf77&time=2026-06-21T12:00:00%2B02:00", "public", EVERYONE),
  route("GET", "api/v1/bench/reference", "/api/v1/bench/reference", "public", EVERYONE, { note: "The benchmark's framework floor: answers only while `npm run bench` sets ROOSTLINE_BENCH_REFERENCE, 404 otherwise." }),
  route("POST", "api/v1/tools/timecode/pulses", "/api/v1/tools/timecode/pulses", "public", EVERYONE, { body: { standard: "dcf77", pulses: [{ startMs: 0, widthMs: 100 }, { startMs: 1000, widthMs: 200 }] } }),

  // better-auth's catch-all: its session endpoint is open, its admin plugin is for admins only.
  route("GET", "api/auth/[...all]", "/api/auth/get-session", "better-auth", EVERYONE),
  route("POST", "api/auth/[...all]", "/api/auth/sign-up/email", "better-auth", [], {
    body: { email: "{email}", password: "a-long-enough-password", name: "Self Signed" },
    refusal: { status: 400, code: "EMAIL_PASSWORD_SIGN_UP_DISABLED" },
    note: "Accounts come only from the seed and from invitations (disableSignUp).",
  }),
  // The auth library's own admin endpoints are not served: people are managed through /api/v1/users
  // and the People page, which keep the last-active-admin rule, the audit log and the password rules.
  ...(
    [
      ["GET", "/api/auth/admin/list-users", undefined],
      ["POST", "/api/auth/admin/set-role", { userId: MISSING.uuid, role: "admin" }],
      ["POST", "/api/auth/admin/ban-user", { userId: MISSING.uuid }],
      ["POST", "/api/auth/admin/create-user", { email: "admin@hollowmere.example", password: "a-long-enough-password", name: "Duplicate", role: "viewer" }],
      ["POST", "/api/auth/admin/impersonate-user", { userId: MISSING.uuid }],
      ["POST", "/api/auth/admin/remove-user", { userId: MISSING.uuid }],
    ] as const
  ).map(([method, path, body]) =>
    route(method, "api/auth/[...all]", path, "better-auth", [], { ...(body ? { body } : {}), refusal: { status: 404, code: "not_found" }, note: "Not served: manage people through /api/v1/users." }),
  ),

  // Devices: a controller's own serial only; user sessions are no way in.
  route("GET", "api/v1/controllers/[serial]/config", "/api/v1/controllers/{serial}/config", "own-serial", DEVICE, {
    extra: [{ label: "device token, another controller's serial", identity: "device", path: "/api/v1/controllers/{otherSerial}/config", expect: "deny" }],
  }),
  route("POST", "api/v1/controllers/[serial]/check-ins", "/api/v1/controllers/{serial}/check-ins", "own-serial", DEVICE, {
    body: {},
    extra: [{ label: "device token, another controller's serial", identity: "device", path: "/api/v1/controllers/{otherSerial}/check-ins", expect: "deny" }],
  }),

  // Signed-in users.
  route("GET", "api/v1/me", "/api/v1/me", "signed-in", SIGNED_IN),
  by("profiles:read", "GET", "api/v1/profiles", "/api/v1/profiles"),
  by("profiles:edit", "POST", "api/v1/profiles", "/api/v1/profiles", { body: {} }),
  by("profiles:read", "GET", "api/v1/profiles/[profileId]", "/api/v1/profiles/{profileId}"),
  by("profiles:edit", "POST", "api/v1/profiles/[profileId]/revisions", "/api/v1/profiles/{profileId}/revisions", { body: {} }),
  by("profiles:edit", "POST", "api/v1/profiles/[profileId]/migrate", "/api/v1/profiles/{profileId}/migrate", { body: {} }),
  by("profiles:read", "GET", "api/v1/revisions/[revisionId]", "/api/v1/revisions/{revisionId}"),
  by("profiles:edit", "POST", "api/v1/revisions/[revisionId]/submit", `/api/v1/revisions/${MISSING.id}/submit`, { body: {} }),
  by("profiles:edit", "POST", "api/v1/revisions/[revisionId]/withdraw", `/api/v1/revisions/${MISSING.id}/withdraw`),
  by("reviews:decide", "POST", "api/v1/revisions/[revisionId]/decision", "/api/v1/revisions/{revisionId}/decision", { body: {} }),
  by("profiles:read", "GET", "api/v1/revisions/[revisionId]/comments", "/api/v1/revisions/{revisionId}/comments"),
  by("reviews:comment", "POST", "api/v1/revisions/[revisionId]/comments", "/api/v1/revisions/{revisionId}/comments", { body: {} }),
  by("profiles:read", "GET", "api/v1/compare", "/api/v1/compare?from={otherRevisionId}&to={revisionId}"),
  by("reviews:decide", "GET", "api/v1/reviews", "/api/v1/reviews"),
  by("audit:read", "GET", "api/v1/audit", "/api/v1/audit?limit=5"),

  by("controllers:read", "GET", "api/v1/controllers", "/api/v1/controllers"),
  by("controllers:manage", "POST", "api/v1/controllers", "/api/v1/controllers", { body: {} }),
  by("controllers:manage", "POST", "api/v1/controllers/import", "/api/v1/controllers/import", { body: {} }),
  by("controllers:manage", "PATCH", "api/v1/controllers/[serial]", "/api/v1/controllers/{serial}", { body: {} }),
  by("tokens:manage", "POST", "api/v1/controllers/[serial]/token", `/api/v1/controllers/${MISSING.serial}/token`),
  by("tokens:manage", "DELETE", "api/v1/controllers/[serial]/token", `/api/v1/controllers/${MISSING.serial}/token`),
  by("controllers:read", "GET", "api/v1/controllers/[serial]/calibrations", "/api/v1/controllers/{serial}/calibrations"),
  by("calibrations:upload", "POST", "api/v1/controllers/[serial]/calibrations", "/api/v1/controllers/{serial}/calibrations", { body: {} }),
  by("calibrations:upload", "POST", "api/v1/calibrations/[runId]/draft", `/api/v1/calibrations/${MISSING.id}/draft`),

  by("sites:read", "GET", "api/v1/sites", "/api/v1/sites"),
  by("sites:manage", "POST", "api/v1/sites", "/api/v1/sites", { body: {} }),
  by("sites:manage", "PATCH", "api/v1/sites/[siteId]", "/api/v1/sites/{siteId}", { body: {} }),

  by("controllers:read", "GET", "api/v1/releases", "/api/v1/releases"),
  by("releases:manage", "POST", "api/v1/releases", "/api/v1/releases", { body: {} }),
  by("releases:manage", "POST", "api/v1/releases/preview", "/api/v1/releases/preview", { body: {} }),
  by("releases:manage", "PATCH", "api/v1/releases/[releaseId]", "/api/v1/releases/{releaseId}", { body: {} }),

  by("users:manage", "GET", "api/v1/users", "/api/v1/users"),
  by("users:manage", "POST", "api/v1/users", "/api/v1/users", { body: {} }),
  by("users:manage", "GET", "api/v1/users/[userId]", "/api/v1/users/{userId}"),
  by("users:manage", "PATCH", "api/v1/users/[userId]", `/api/v1/users/${MISSING.uuid}`, { body: {} }),
  by("mail:read", "GET", "api/v1/mail", "/api/v1/mail?limit=5"),
  by("mail:read", "GET", "api/v1/mail/[mailId]", "/api/v1/mail/{mailId}"),

  // Server actions, posted to the page that uses them.
  action("app/(console)/actions.ts", "signOutAction", "/", "proxy", SIGNED_IN, {}, {
    endsSession: true,
    forged: "allow",
    note: "Ending a session that does not exist is harmless, so a forged cookie is simply sent to sign-in.",
  }),
  action("app/(console)/account/actions.ts", "changePasswordAction", "/account", "signed-in", SIGNED_IN, {}),
  action("app/(console)/admin/mail/actions.ts", "retryMailAction", "/admin/mail", "mail:read", rolesWith("mail:read"), { mailId: String(MISSING.id) }),
  action("app/(console)/admin/settings/actions.ts", "setApprovalsAction", "/admin/settings", "settings:manage", rolesWith("settings:manage"), { approvals: "" }),
  action("app/(console)/admin/users/actions.ts", "inviteUserAction", "/admin/users", "users:manage", rolesWith("users:manage"), {}, {
    extra: [{ label: "admin session, cross-site Origin", identity: "admin", origin: "https://evil.example", fields: { name: "Cross Site", email: "{email}", role: "viewer" }, expect: "deny" }],
  }),
  action("app/(console)/admin/users/actions.ts", "changeRoleAction", "/admin/users", "users:manage", rolesWith("users:manage"), { userId: "", role: "admin" }),
  action("app/(console)/admin/users/actions.ts", "deactivateUserAction", "/admin/users", "users:manage", rolesWith("users:manage"), { userId: "" }),
  action("app/(console)/admin/users/actions.ts", "reactivateUserAction", "/admin/users", "users:manage", rolesWith("users:manage"), { userId: "" }),
  action("app/(console)/admin/users/actions.ts", "resendInvitationAction", "/admin/users", "users:manage", rolesWith("users:manage"), { userId: "" }),
];

/** The file an entry lives in, relative to the repository. */
export const entryFile = (e: MatrixEntry) => (e.kind === "route" ? `app/${e.dir}/route.ts` : e.file);

/** A short name for an entry: "GET /api/v1/me" or "inviteUserAction (app/…/actions.ts)". */
export const entryName = (e: MatrixEntry) => (e.kind === "route" ? `${e.method} ${e.path}` : `${e.name} (${e.file})`);

/** What the forged-credentials cell expects. */
export const forgedExpectation = (e: MatrixEntry): Expectation => e.forged ?? (e.allow.includes("anonymous") ? "allow" : "deny");

const mark = (allowed: boolean) => (allowed ? "✓" : "·");
const code = (s: string) => "`" + s.replace(/\|/g, "\\|") + "`";

/** The table as Markdown, for people to read. */
export function renderMatrixMarkdown(entries: readonly MatrixEntry[] = MATRIX): string {
  const head = ["Endpoint", "Guard", ...IDENTITIES, "forged", "Sample"];
  const lines = [
    "# Authorization matrix",
    "",
    "✓ gets through, · is refused (401/403, a server action's `unauthenticated`/`forbidden`, or the sign-in redirect).",
    "**forged**: a made-up session cookie and bearer token. Generated by tests/integration/authz-matrix.test.ts from tests/support/authz-matrix.ts.",
    "",
    `| ${head.join(" | ")} |`,
    `| ${head.map(() => "---").join(" | ")} |`,
  ];
  for (const e of entries) {
    const endpoint = e.kind === "route" ? `${e.method} ${code(e.path)}` : `${code(e.name)} on ${code(e.page)}`;
    const sample = e.kind === "route" ? (e.body === undefined ? "" : code(JSON.stringify(e.body))) : code(JSON.stringify(e.fields));
    const cells = IDENTITIES.map((id) => mark(e.allow.includes(id)));
    lines.push(`| ${endpoint} | ${e.guard} | ${cells.join(" | ")} | ${mark(forgedExpectation(e) === "allow")} | ${sample} |`);
  }
  const extras = entries.flatMap((e) => (e.extra ?? []).map((x) => `- ${entryName(e)} — ${x.label}: ${x.expect}`));
  const notes = entries.filter((e) => e.note).map((e) => `- ${entryName(e)}: ${e.note}`);
  lines.push("", "## Further cells", "", ...extras, "", "## Notes", "", ...notes, "", "## Placeholders", "");
  lines.push(...Object.entries(PLACEHOLDERS).map(([k, v]) => `- \`{${k}}\`: ${v}`));
  lines.push(`- missing ids: ${MISSING.id}, ${MISSING.uuid}, ${MISSING.serial}`, "");
  return lines.join("\n");
}
