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
 * Posts `[prevState, formData]` to a useActionState action. React's encodeReply sends a
 * multipart body: field "0" holds the argument list, "$K1" points at the FormData, whose
 * entries travel as "_1_<name>" (react-server-dom: `"_" + partId + "_"`).
 */
export async function callFormAction(opts: { pagePath: string; id: string; cookie: string; prevState: unknown; fields: Record<string, string> }) {
  const body = new FormData();
  for (const [name, value] of Object.entries(opts.fields)) body.append(`_1_${name}`, value);
  body.append("0", JSON.stringify([opts.prevState, "$K1"]));
  const response = await fetch(appUrl(opts.pagePath), {
    method: "POST",
    headers: { cookie: opts.cookie, "Next-Action": opts.id, Accept: "text/x-component", Origin: BASE_URL },
    body,
  });
  const text = await response.text();
  return { status: response.status, text, result: actionResult(text) };
}

/** The action's return value in an RSC payload: the row that is an object with `ok`. */
function actionResult(payload: string): Record<string, unknown> | null {
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
