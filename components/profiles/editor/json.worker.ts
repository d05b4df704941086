// Monaco's JSON language service (completion, hover, schema validation), run off the main thread.
import "monaco-editor/languages/features/json/json.worker.js";
