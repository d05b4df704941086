// Monaco's generic editor worker (diffing, word ranges); every language without its own worker uses it.
import "monaco-editor/editor/editor.worker.js";
