// The OpenAPI 3.1 description of the device API and the admin endpoints scripts use. A unit test
// fails when a route under app/api/v1/{controllers,device,releases} is missing here, and the
// integration tests check the examples and the served configuration against these schemas.

/** A JSON Schema (2020-12, the dialect OpenAPI 3.1 uses) as plain data. */
export type JsonSchema = { [keyword: string]: unknown };
type Ref = { $ref: string };
type MediaType = { schema: JsonSchema | Ref; example?: unknown };
type Header = { description: string; schema: JsonSchema };
type ResponseObject = { description: string; headers?: Record<string, Header | Ref>; content?: Record<string, MediaType> };
type Parameter = { name: string; in: "path" | "query" | "header"; required: boolean; description: string; schema: JsonSchema };
export type Operation = {
  operationId: string;
  summary: string;
  description?: string;
  tags: string[];
  security: Record<string, string[]>[];
  parameters?: (Parameter | Ref)[];
  requestBody?: { required: boolean; content: Record<string, MediaType> };
  responses: Record<string, ResponseObject | Ref>;
};
export type HttpMethod = "get" | "post" | "patch" | "delete";
export type PathItem = Partial<Record<HttpMethod, Operation>>;
export type OpenApiDocument = {
  openapi: "3.1.0";
  info: { title: string; version: string; description: string };
  servers: { url: string; description?: string }[];
  tags: { name: string; description: string }[];
  paths: Record<string, PathItem>;
  components: {
    securitySchemes: Record<string, Record<string, string>>;
    headers: Record<string, Header>;
    parameters: Record<string, Parameter>;
    responses: Record<string, ResponseObject>;
    schemas: Record<string, JsonSchema>;
  };
};

const ref = (kind: "schemas" | "responses" | "headers" | "parameters", name: string): Ref => ({ $ref: `#/components/${kind}/${name}` });
const json = (schema: JsonSchema | Ref, example?: unknown): Record<string, MediaType> => ({ "application/json": example === undefined ? { schema } : { schema, example } });
const ok = (description: string, schema: JsonSchema | Ref, headers?: Record<string, Header | Ref>): ResponseObject => ({ description, ...(headers ? { headers } : {}), content: json(schema) });
const errors = (...codes: ("400" | "401" | "403" | "404" | "409" | "429" | "503")[]) => Object.fromEntries(codes.map((c) => [c, ref("responses", `E${c}`)]));
const body = (schema: JsonSchema | Ref, example?: unknown) => ({ required: true, content: json(schema, example) });

const DEVICE = [{ controllerToken: [] }];
const SESSION = [{ session: [] }];
const PUBLIC: Record<string, string[]>[] = [];

const hex64: JsonSchema = { type: "string", pattern: "^[0-9a-f]{64}$" };
const nullableHex64: JsonSchema = { type: ["string", "null"], pattern: "^[0-9a-f]{64}$" };
const id: JsonSchema = { type: "integer", minimum: 1 };
// The route's own limit: counters are unsigned 32-bit in the firmware and the database.
const count = (description: string, nullable = false): JsonSchema => ({ type: nullable ? ["integer", "null"] : "integer", minimum: 0, maximum: 4294967295, description });

/** The example check-in; the integration test posts it and expects 201. */
export const checkInExample = {
  appliedHash: "999a7866fd610c0d0869a3533c8819f5cd9b92c51d4be772e4b465bc60debc58",
  refusedReason: null,
  firmwareVersion: "1.4.2",
  uptimeS: 86400,
  counters: { doorCycles: 412, lastOpenCounts: 17104, lastCloseCounts: 17112, lastTravelMs: 4310, stallEvents: 1, timeFixAgeS: 5400 },
};

const VERIFY = [
  "The body is signed, not the bytes on the wire. To verify:",
  "1. Parse the JSON and remove the `signature` member (keep every other member, including ones this version does not list).",
  "2. Write the rest as canonical JSON: object keys sorted by UTF-16 code units at every level, no whitespace, strings and numbers as JSON.stringify writes them.",
  "3. Check `signature.value` (base64, 64 bytes) as an Ed25519 signature (RFC 8032) over the UTF-8 bytes of that text, with the key from GET /api/v1/device/public-key.",
  "4. Check `serial` is your own and `contentHash` is the SHA-256 (lower-case hex) of the canonical JSON of `parameters`.",
  "Refuse anything that fails, keep running the configuration you have, and say why in the next check-in (`refusedReason`).",
  "Send the ETag back as If-None-Match; 304 means keep what you run.",
].join("\n");

const serialParam: Parameter = { name: "serial", in: "path", required: true, description: "The controller's serial, e.g. HM350-0001.", schema: { type: "string", pattern: "^[A-Z0-9][A-Z0-9-]{3,31}$" } };

/** The OpenAPI 3.1 document served at /api/v1/openapi.json. */
export const openApiDocument: OpenApiDocument = {
  openapi: "3.1.0",
  info: {
    title: "Roostline device API",
    version: "1",
    description: "Controllers download their signed configuration and check in with what they applied; admins register controllers, manage their tokens and release approved revisions. Errors always have the body `Error`.",
  },
  servers: [{ url: "/" }],
  tags: [
    { name: "device", description: "Called by controllers with their bearer token." },
    { name: "fleet", description: "Called by people and scripts with a console session." },
    { name: "service", description: "Public, no credentials." },
  ],
  paths: {
    "/api/v1/controllers/{serial}/config": {
      get: {
        operationId: "getConfiguration",
        summary: "The calling controller's signed configuration",
        description: VERIFY,
        tags: ["device"],
        security: DEVICE,
        parameters: [ref("parameters", "serial"), { name: "If-None-Match", in: "header", required: false, description: "The ETag of the configuration the controller runs.", schema: { type: "string" } }],
        responses: {
          "200": ok("The signed configuration of the newest release that covers this controller and whose stage includes it.", ref("schemas", "SignedConfiguration"), { ETag: ref("headers", "ETag") }),
          "304": { description: "Unchanged since the ETag sent in If-None-Match; no body.", headers: { ETag: ref("headers", "ETag") } },
          ...errors("401", "403"),
          "404": { description: "Nothing has been released to this controller yet; keep the configuration you run.", content: json(ref("schemas", "Error")) },
          ...errors("429", "503"),
        },
      },
    },
    "/api/v1/controllers/{serial}/check-ins": {
      post: {
        operationId: "checkIn",
        summary: "Report what was applied (or why not) and the counters",
        tags: ["device"],
        security: DEVICE,
        parameters: [ref("parameters", "serial")],
        requestBody: body(ref("schemas", "CheckIn"), checkInExample),
        responses: { "201": ok("Stored.", { type: "object", properties: { ok: { const: true } }, required: ["ok"] }), ...errors("400", "401", "403", "429", "503") },
      },
    },
    "/api/v1/device/public-key": {
      get: {
        operationId: "getPublicKey",
        summary: "The Ed25519 key configurations are signed with",
        description: "Public; cache it (max-age 3600) and pin it in the firmware where you can.",
        tags: ["device"],
        security: PUBLIC,
        responses: { "200": ok("The public key as PEM (SPKI) and as its raw 32 bytes in base64.", ref("schemas", "PublicKey")), ...errors("503") },
      },
    },
    "/api/v1/controllers": {
      get: {
        operationId: "listControllers",
        summary: "Every controller",
        description: "Needs the controllers:read permission.",
        tags: ["fleet"],
        security: SESSION,
        responses: { "200": ok("Controllers by serial.", { type: "object", properties: { controllers: { type: "array", items: ref("schemas", "Controller") } }, required: ["controllers"] }), ...errors("401", "403", "503") },
      },
      post: {
        operationId: "registerController",
        summary: "Register a controller",
        description: "Needs controllers:manage (technicians, admins). The answer carries the controller's token this once; only its hash is kept.",
        tags: ["fleet"],
        security: SESSION,
        requestBody: body(ref("schemas", "ControllerRegistration"), { serial: "HM350-0001", doorModelId: 1, siteId: 1, firmwareVersion: "1.4.2", parameterSetVersion: 2 }),
        responses: { "201": ok("Registered.", ref("schemas", "ControllerRegistered")), ...errors("400", "401", "403", "409", "503") },
      },
    },
    "/api/v1/controllers/import": {
      post: {
        operationId: "importControllers",
        summary: "Register controllers from CSV text",
        description: "Needs controllers:manage. Nothing is imported when any row is wrong (400, one issue per row as /rows/{row}/{column}) unless `onlyGoodRows`; each new serial comes with its token, shown this once.",
        tags: ["fleet"],
        security: SESSION,
        requestBody: body({ type: "object", properties: { csv: { type: "string", minLength: 1, maxLength: 1048576 }, onlyGoodRows: { type: "boolean", default: false } }, required: ["csv"] }),
        responses: {
          "201": ok("Imported.", { type: "object", properties: { imported: { type: "array", items: { type: "object", properties: { serial: { type: "string" }, token: ref("schemas", "Token") }, required: ["serial", "token"] } }, skipped: { type: "array", items: ref("schemas", "Issue") } }, required: ["imported", "skipped"] }),
          ...errors("400", "401", "403", "503"),
        },
      },
    },
    "/api/v1/controllers/{serial}/calibrations": {
      get: {
        operationId: "listCalibrationRuns",
        summary: "A controller's calibration runs with their analyses",
        description: "Needs controllers:read.",
        tags: ["fleet"],
        security: SESSION,
        parameters: [ref("parameters", "serial")],
        responses: { "200": ok("Runs, newest first.", { type: "object", properties: { runs: { type: "array", items: { type: "object" } } }, required: ["runs"] }), ...errors("401", "403", "404", "503") },
      },
      post: {
        operationId: "uploadCalibrationRun",
        summary: "Upload a recorded calibration run (CSV, at most 5 MiB)",
        description: "Needs calibrations:upload. A file that cannot be read is refused with 400 naming its rows, and nothing is stored.",
        tags: ["fleet"],
        security: SESSION,
        parameters: [ref("parameters", "serial")],
        requestBody: body({ type: "object", properties: { fileName: { type: "string", minLength: 1, maxLength: 191 }, csv: { type: "string", minLength: 1 }, stallFraction: { type: "number", minimum: 0.3, maximum: 0.85 } }, required: ["fileName", "csv"] }),
        responses: {
          "201": ok("Stored, with the analysis and suggested parameters.", { type: "object", properties: { runId: id, warnings: { type: "array", items: { type: "string" } }, suggested: { type: "object" }, calibration: { type: "object" } }, required: ["runId", "warnings", "suggested", "calibration"] }),
          ...errors("400", "401", "403", "404", "503"),
        },
      },
    },
    "/api/v1/calibrations/{runId}/draft": {
      post: {
        operationId: "draftOverlayFromRun",
        summary: "Turn a run's suggestion into a draft controller overlay",
        description: "Needs calibrations:upload. The draft then goes through review like any revision.",
        tags: ["fleet"],
        security: SESSION,
        parameters: [{ name: "runId", in: "path", required: true, description: "The calibration run's id.", schema: id }],
        responses: { "201": ok("The overlay profile and its new draft revision.", { type: "object", properties: { profileId: id, revisionId: id }, required: ["profileId", "revisionId"] }), ...errors("401", "403", "404", "409", "503") },
      },
    },
    "/api/v1/controllers/{serial}": {
      patch: {
        operationId: "updateController",
        summary: "Move a controller to another site or door model, or record new firmware",
        description: "Needs controllers:manage (technicians and admins). Body: any of siteId, doorModelId, firmwareVersion, parameterSetVersion; other fields are refused.",
        tags: ["fleet"],
        security: SESSION,
        parameters: [ref("parameters", "serial")],
        requestBody: { required: true, content: { "application/json": { schema: { type: "object", additionalProperties: false, minProperties: 1, properties: { siteId: { type: "integer", minimum: 1 }, doorModelId: { type: "integer", minimum: 1 }, firmwareVersion: { type: "string", pattern: "^\\d+\\.\\d+\\.\\d+$" }, parameterSetVersion: { enum: [1, 2] } } } } } },
        responses: { "200": ok("The controller as it is now.", { type: "object" }), ...errors("400", "401", "403", "404", "503") },
      },
    },
    "/api/v1/controllers/{serial}/token": {
      post: {
        operationId: "rotateToken",
        summary: "Issue a new token and revoke the old ones",
        description: "Needs tokens:manage (admins). The new token is shown this once.",
        tags: ["fleet"],
        security: SESSION,
        parameters: [ref("parameters", "serial")],
        responses: { "201": ok("The new token.", { type: "object", properties: { token: ref("schemas", "Token") }, required: ["token"] }), ...errors("401", "403", "404", "503") },
      },
      delete: {
        operationId: "revokeTokens",
        summary: "Revoke every token of the controller",
        description: "Needs tokens:manage (admins). The controller's next request gets 401.",
        tags: ["fleet"],
        security: SESSION,
        parameters: [ref("parameters", "serial")],
        responses: { "200": ok("Revoked.", { type: "object", properties: { ok: { const: true } }, required: ["ok"] }), ...errors("401", "403", "404", "503") },
      },
    },
    "/api/v1/releases": {
      get: {
        operationId: "listReleases",
        summary: "Every release, newest first",
        description: "Needs controllers:read.",
        tags: ["fleet"],
        security: SESSION,
        responses: { "200": ok("Up to 100 releases.", { type: "object", properties: { releases: { type: "array", items: ref("schemas", "ReleaseListItem") } }, required: ["releases"] }), ...errors("401", "403", "503") },
      },
      post: {
        operationId: "createRelease",
        summary: "Release an approved base revision",
        description: "Needs releases:manage (admins). Refused with 400, one issue per controller, when any affected controller would get an invalid configuration.",
        tags: ["fleet"],
        security: SESSION,
        requestBody: body(ref("schemas", "ReleaseRequest"), { baseRevisionId: 12, target: { kind: "door_model" }, percent: 10, note: "first stage" }),
        responses: { "201": ok("Released.", ref("schemas", "ReleaseCreated")), ...errors("400", "401", "403", "404", "409", "503") },
      },
    },
    "/api/v1/releases/preview": {
      post: {
        operationId: "previewRelease",
        summary: "What a release would do, without releasing",
        description: "Needs releases:manage.",
        tags: ["fleet"],
        security: SESSION,
        requestBody: body(ref("schemas", "ReleaseRequest")),
        responses: { "200": ok("Affected controllers, the first stage, problems and safety-relevant changes.", ref("schemas", "ReleasePreview")), ...errors("400", "401", "403", "404", "409", "503") },
      },
    },
    "/api/v1/releases/{releaseId}": {
      patch: {
        operationId: "updateRelease",
        summary: "Widen, pause, resume or roll back a release",
        description: "Needs releases:manage. A release only widens (400 for a smaller percent); a rolled-back release cannot change (409).",
        tags: ["fleet"],
        security: SESSION,
        parameters: [{ name: "releaseId", in: "path", required: true, description: "The release's id.", schema: id }],
        requestBody: body(ref("schemas", "ReleaseChange"), { percent: 50 }),
        responses: { "200": ok("The release after the change.", { type: "object", properties: { release: ref("schemas", "Release") }, required: ["release"] }), ...errors("400", "401", "403", "404", "409", "503") },
      },
    },
    "/api/v1/health": {
      get: {
        operationId: "getHealth",
        summary: "Liveness and database reachability",
        tags: ["service"],
        security: PUBLIC,
        responses: { "200": ok("Up, and the database answers.", { type: "object", properties: { status: { const: "ok" } }, required: ["status"] }), ...errors("503") },
      },
    },
    "/api/v1/openapi.json": {
      get: {
        operationId: "getOpenApi",
        summary: "This document",
        tags: ["service"],
        security: PUBLIC,
        responses: { "200": ok("OpenAPI 3.1.", { type: "object" }) },
      },
    },
  },
  components: {
    securitySchemes: {
      controllerToken: { type: "http", scheme: "bearer", description: "The controller's token (rlc_…), shown once at registration or rotation; the server keeps only its SHA-256. At most DEVICE_RATE_LIMIT_PER_MINUTE requests a minute per controller." },
      session: { type: "apiKey", in: "cookie", name: "better-auth.session_token", description: "The console's sign-in session cookie (better-auth; `__Secure-` prefixed over HTTPS). Sign in through the console first." },
    },
    headers: {
      ETag: { description: "A strong entity tag of the signed body; send it back as If-None-Match.", schema: { type: "string", pattern: '^"[0-9a-f]{40}"$' } },
      RetryAfter: { description: "Seconds to wait before trying again.", schema: { type: "integer", minimum: 1 } },
    },
    parameters: { serial: serialParam },
    responses: {
      E400: { description: "The body or a parameter is not valid; `issues` names each field by its JSON pointer.", content: json(ref("schemas", "Error")) },
      E401: { description: "No credentials, or a wrong, expired or revoked token or session.", content: json(ref("schemas", "Error")) },
      E403: { description: "The role lacks the permission, or a controller used another controller's serial.", content: json(ref("schemas", "Error")) },
      E404: { description: "Not found.", content: json(ref("schemas", "Error")) },
      E409: { description: "The state changed underneath (a duplicate serial, an unapproved or rolled-back revision or release).", content: json(ref("schemas", "Error")) },
      E429: { description: "Too many requests from this controller.", headers: { "Retry-After": ref("headers", "RetryAfter") }, content: json(ref("schemas", "Error")) },
      E503: { description: "The database is unreachable or signing is not set up.", headers: { "Retry-After": ref("headers", "RetryAfter") }, content: json(ref("schemas", "Error")) },
    },
    schemas: {
      Error: {
        type: "object",
        properties: {
          error: { type: "string", enum: ["invalid_request", "invalid_profile", "unauthenticated", "forbidden", "not_found", "conflict", "rate_limited", "unavailable", "internal"] },
          message: { type: "string", description: "One sentence for people." },
          issues: { type: "array", items: ref("schemas", "Issue") },
        },
        required: ["error", "message"],
      },
      Issue: { type: "object", properties: { path: { type: "string", description: 'JSON pointer of the field, e.g. "/counters/doorCycles"; "" for the whole body.' }, message: { type: "string" } }, required: ["path", "message"] },
      SignedConfiguration: {
        type: "object",
        description: "Verify before applying; see the operation's description.",
        properties: {
          serial: { type: "string" },
          parameterSetVersion: { type: "integer", enum: [1, 2] },
          parameters: { type: "object", description: "The effective parameters (the base, then the site's overlay, then the controller's own overlay on top), valid against the parameter-set JSON Schema whose $id is https://roostline.invalid/schemas/door-params/{parameterSetVersion} (for example https://roostline.invalid/schemas/door-params/2). The $id is a name, not a location: nothing is fetched." },
          contentHash: { ...hex64, description: "SHA-256 (lower-case hex) of the canonical JSON of `parameters`; report it as `appliedHash`." },
          releaseId: id,
          baseRevisionId: id,
          overlayRevisionId: { type: ["integer", "null"], minimum: 1 },
          issuedAt: { type: "string", format: "date-time", description: "When the release last changed; the same assignment always gives the same bytes." },
          signature: {
            type: "object",
            properties: { algorithm: { const: "Ed25519" }, value: { type: "string", pattern: "^[A-Za-z0-9+/]{86}==$", description: "Base64 of the 64-byte signature." }, signed: { type: "string", description: "What was signed, in words." } },
            required: ["algorithm", "value", "signed"],
          },
        },
        required: ["serial", "parameterSetVersion", "parameters", "contentHash", "releaseId", "baseRevisionId", "overlayRevisionId", "issuedAt", "signature"],
      },
      CheckIn: {
        type: "object",
        additionalProperties: false,
        properties: {
          appliedHash: { ...nullableHex64, description: "The contentHash of the configuration now running; null when none was ever applied." },
          refusedReason: { type: ["string", "null"], minLength: 1, maxLength: 500, pattern: "\\S", description: "Why the last configuration served was not applied (trimmed; at most 500 characters)." },
          firmwareVersion: { type: "string", pattern: "^\\d+\\.\\d+\\.\\d+([-+][0-9A-Za-z.-]+)?$", description: "e.g. 1.4.2" },
          uptimeS: count("Seconds since power-up."),
          counters: {
            type: "object",
            description: "Other members are ignored.",
            properties: {
              doorCycles: count("Door movements since manufacture."),
              lastOpenCounts: count("Encoder counts of the last opening, to the open sensor.", true),
              lastCloseCounts: count("Encoder counts of the last closing.", true),
              lastTravelMs: count("Duration of the last movement.", true),
              stallEvents: count("Stalls detected since manufacture."),
              timeFixAgeS: count("Seconds since the last good time-signal fix; null when there was none.", true),
            },
            required: ["doorCycles", "lastOpenCounts", "lastCloseCounts", "lastTravelMs", "stallEvents", "timeFixAgeS"],
          },
        },
        required: ["appliedHash", "firmwareVersion", "uptimeS", "counters"],
        // Without an applied configuration the controller must say why.
        if: { properties: { appliedHash: { type: "null" } }, required: ["appliedHash"] },
        then: { properties: { refusedReason: { type: "string" } }, required: ["refusedReason"] },
      },
      PublicKey: {
        type: "object",
        properties: { algorithm: { const: "Ed25519" }, pem: { type: "string", description: "SPKI, PEM armoured." }, raw: { type: "string", pattern: "^[A-Za-z0-9+/]{43}=$", description: "The raw 32-byte key in base64." } },
        required: ["algorithm", "pem", "raw"],
      },
      ControllerRegistration: {
        type: "object",
        description: "The serial is trimmed and upper-cased first.",
        properties: {
          serial: { type: "string", pattern: "^[A-Z0-9][A-Z0-9-]{3,31}$" },
          doorModelId: id,
          siteId: id,
          firmwareVersion: { type: "string", pattern: "^\\d+\\.\\d+\\.\\d+$" },
          parameterSetVersion: { type: "integer", enum: [1, 2] },
        },
        required: ["serial", "doorModelId", "siteId", "firmwareVersion", "parameterSetVersion"],
      },
      Token: { type: "string", pattern: "^rlc_[A-Za-z0-9_-]{43}$", description: "Store it in the controller now; it is not shown again." },
      ControllerRegistered: { type: "object", properties: { controllerId: id, token: ref("schemas", "Token"), note: { type: "string" } }, required: ["controllerId", "token"] },
      Controller: {
        type: "object",
        properties: {
          id,
          serial: { type: "string" },
          firmwareVersion: { type: "string" },
          parameterSetVersion: { type: "integer" },
          runningHash: { ...nullableHex64, description: "What the controller last reported applying." },
          lastSeenAt: { type: ["string", "null"], format: "date-time" },
          siteId: id,
          siteName: { type: "string" },
          doorModelId: id,
          doorModelName: { type: "string" },
        },
        required: ["id", "serial", "firmwareVersion", "parameterSetVersion", "runningHash", "lastSeenAt", "siteId", "siteName", "doorModelId", "doorModelName"],
      },
      ReleaseRequest: {
        type: "object",
        properties: {
          baseRevisionId: { ...id, description: "An approved revision of a base profile; the newest approved site overlays come with it." },
          target: {
            oneOf: [
              { type: "object", properties: { kind: { const: "door_model" } }, required: ["kind"] },
              { type: "object", properties: { kind: { const: "site" }, siteId: id }, required: ["kind", "siteId"] },
              { type: "object", properties: { kind: { const: "controllers" }, serials: { type: "array", items: { type: "string", minLength: 1, maxLength: 32 }, minItems: 1, maxItems: 1000 } }, required: ["kind", "serials"] },
            ],
          },
          percent: { type: "integer", minimum: 1, maximum: 100, description: "The share of covered controllers served; a controller's place in the order depends only on its serial." },
          note: { type: "string", maxLength: 500 },
        },
        required: ["baseRevisionId", "target", "percent"],
      },
      ReleaseCreated: { type: "object", properties: { releaseId: id, affected: { type: "integer", minimum: 0 }, inFirstStage: { type: "integer", minimum: 0 } }, required: ["releaseId", "affected", "inFirstStage"] },
      ReleasePreview: {
        type: "object",
        properties: {
          affected: { type: "integer", minimum: 0 },
          inFirstStage: { type: "integer", minimum: 0 },
          problems: { type: "array", items: { type: "object", properties: { serial: { type: "string" }, reasons: { type: "array", items: { type: "string" } } }, required: ["serial", "reasons"] } },
          safetyChanges: { type: "array", items: ref("schemas", "DiffRow") },
          overlayRevisionIds: { type: "object", additionalProperties: id, description: "Site id → the overlay revision pinned for it." },
          doorModelId: id,
        },
        required: ["affected", "inFirstStage", "problems", "safetyChanges", "overlayRevisionIds", "doorModelId"],
      },
      DiffRow: {
        type: "object",
        properties: {
          path: { type: "string" },
          change: { enum: ["added", "removed", "changed"] },
          before: { description: "Absent when added." },
          after: { description: "Absent when removed." },
          title: { type: ["string", "null"] },
          unit: { type: ["string", "null"] },
          relativeChange: { type: ["number", "null"] },
          safety: { type: "boolean" },
        },
        required: ["path", "change", "title", "unit", "relativeChange", "safety"],
      },
      ReleaseChange: {
        type: "object",
        additionalProperties: false,
        minProperties: 1,
        properties: { percent: { type: "integer", minimum: 1, maximum: 100 }, state: { enum: ["active", "paused", "rolled_back"] } },
      },
      Release: {
        type: "object",
        properties: {
          id,
          baseRevisionId: id,
          doorModelId: id,
          overlayRevisionIds: { type: "object", additionalProperties: id },
          targetKind: { enum: ["door_model", "site", "controllers"] },
          targetSiteId: { type: ["integer", "null"] },
          targetSerials: { type: ["array", "null"], items: { type: "string" } },
          percent: { type: "integer", minimum: 1, maximum: 100 },
          state: { enum: ["active", "paused", "rolled_back"] },
          note: { type: ["string", "null"] },
          createdBy: { type: ["string", "null"] },
          createdAt: { type: "string", format: "date-time" },
          updatedAt: { type: "string", format: "date-time" },
        },
        required: ["id", "baseRevisionId", "doorModelId", "overlayRevisionIds", "targetKind", "percent", "state", "createdAt", "updatedAt"],
      },
      ReleaseListItem: { type: "object", properties: { release: ref("schemas", "Release"), profileName: { type: "string" }, revisionNumber: { type: "integer" } }, required: ["release", "profileName", "revisionNumber"] },
    },
  },
};
