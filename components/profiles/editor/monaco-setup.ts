// Monaco from our own bundle, never from a CDN, with its workers served from our build. Imported only by
// the text editor, which the workbench loads on the client alone.
import { loader } from "@monaco-editor/react";
import * as monaco from "monaco-editor";

self.MonacoEnvironment = {
  getWorker(_workerId: string, label: string) {
    if (label === "json") return new Worker(new URL("./json.worker.ts", import.meta.url), { type: "module" });
    return new Worker(new URL("./editor.worker.ts", import.meta.url), { type: "module" });
  },
};

loader.config({ monaco });

type SchemaEntry = { uri: string; fileMatch: string[]; schema: unknown };

// Diagnostics options are global to Monaco's JSON service, so every mounted editor's schema is kept
// here and the whole list is set again on each change.
const registered = new Map<string, SchemaEntry>();

function apply(): void {
  monaco.json.jsonDefaults.setDiagnosticsOptions({
    validate: true,
    allowComments: false,
    enableSchemaRequest: false,
    schemaValidation: "error",
    schemaRequest: "ignore",
    schemas: [...registered.values()],
  });
}

/** Attaches a schema to one model; the returned function detaches it again. */
export function attachSchema(modelPath: string, schemaUri: string, schema: unknown): () => void {
  const fileMatch = monaco.Uri.parse(modelPath).toString();
  registered.set(modelPath, { uri: schemaUri, fileMatch: [fileMatch], schema });
  apply();
  return () => {
    registered.delete(modelPath);
    apply();
  };
}

export { monaco };
