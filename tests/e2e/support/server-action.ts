// Calls a server action over plain HTTP, the way Next's client does, to test its own checks.
import { readFileSync } from "node:fs";
import path from "node:path";
import { appUrl, BASE_URL } from "./browser";

type Manifest = { node: Record<string, { filename: string; exportedName: string }> };

/** The id Next gave an exported action in the running build (.next-test unless NEXT_DIST_DIR says otherwise). */
export function actionId(filename: string, exportedName: string): string {
  const file = path.resolve(process.cwd(), process.env.NEXT_DIST_DIR ?? ".next-test", "server", "server-reference-manifest.json");
  const manifest = JSON.parse(readFileSync(file, "utf8")) as Manifest;
  const entry = Object.entries(manifest.node).find(([, v]) => v.filename === filename && v.exportedName === exportedName);
  if (!entry) throw new Error(`${filename}#${exportedName} is not in ${file}`);
  return entry[0];
}

/**
 * Posts an action's argument list the way React's client does. encodeReply sends a multipart body:
 * field "0" holds the argument list (`"$K1"` points at the FormData), whose entries travel as
 * "_1_<name>" (react-server-dom: `"_" + partId + "_"`). Redirects are not followed, so a bounce to
 * sign-in stays visible; `args` may be any string, to send a malformed list on purpose.
 */
export async function postAction(opts: { pagePath: string; id: string; headers?: Record<string, string>; origin?: string; args: unknown[] | string; fields: [string, string][] }) {
  const body = new FormData();
  for (const [name, value] of opts.fields) body.append(`_1_${name}`, value);
  body.append("0", typeof opts.args === "string" ? opts.args : JSON.stringify(opts.args));
  const response = await fetch(appUrl(opts.pagePath), {
    method: "POST",
    headers: { "Next-Action": opts.id, Accept: "text/x-component", Origin: opts.origin ?? BASE_URL, ...opts.headers },
    body,
    redirect: "manual",
  });
  const text = await response.text();
  return { response, status: response.status, text, result: actionResult(text) };
}

/** Posts `[prevState, formData]` to a useActionState action with a session cookie. */
export async function callFormAction(opts: { pagePath: string; id: string; cookie: string; prevState: unknown; fields: Record<string, string> }) {
  const { status, text, result } = await postAction({ pagePath: opts.pagePath, id: opts.id, headers: { cookie: opts.cookie }, args: [opts.prevState, "$K1"], fields: Object.entries(opts.fields) });
  return { status, text, result };
}

/** The action's return value in an RSC payload: the row that is an object with `ok`. */
export function actionResult(payload: string): Record<string, unknown> | null {
  for (const line of payload.split("\n")) {
    const match = /^[0-9a-f]+:(\{.*\})$/.exec(line);
    if (!match) continue;
    try {
      const value = JSON.parse(match[1]!) as Record<string, unknown>;
      if ("ok" in value) return value;
    } catch {
      // Not JSON: some other row of the payload.
    }
  }
  return null;
}
