// The console's keyboard shortcuts: which keys exist, and a key-sequence matcher. Pure: the
// component feeds it keys and the current time and carries out what it returns.

/** Fired on window to open the shortcuts overlay from elsewhere (the account menu). */
export const SHORTCUTS_OPEN_EVENT = "roostline:shortcuts-open";

/** How long "g" waits for its second key, in milliseconds. */
export const SEQUENCE_TIMEOUT_MS = 1500;

/** Second key after "g" → the area it opens. The letters follow the areas' names (reLeases: c is Controllers). */
export const GO_KEYS: readonly { key: string; href: string }[] = [
  { key: "o", href: "/" },
  { key: "p", href: "/profiles" },
  { key: "r", href: "/reviews" },
  { key: "c", href: "/controllers" },
  { key: "l", href: "/releases" },
  { key: "s", href: "/sites" },
  { key: "t", href: "/tools" },
  { key: "h", href: "/help" },
];

export type GoTarget = { key: string; href: string; label: string };

/** The "g then …" shortcuts a menu offers, in key order; areas missing from the menu get none. */
export function goTargets(menu: readonly { href: string; label: string }[]): GoTarget[] {
  return GO_KEYS.flatMap(({ key, href }) => {
    const item = menu.find((m) => m.href === href);
    return item ? [{ key, href, label: item.label }] : [];
  });
}

export type SequenceState = { pending: "g" | null; at: number };
export type ShortcutAction = { kind: "none" } | { kind: "wait" } | { kind: "help" } | { kind: "search" } | { kind: "go"; href: string };
export type KeyInput = { key: string; ctrlKey?: boolean; metaKey?: boolean; altKey?: boolean };

export const IDLE: SequenceState = { pending: null, at: 0 };

/** Feeds one key press to the matcher; returns the next state and what to do now. */
export function matchKey(state: SequenceState, input: KeyInput, targets: readonly GoTarget[], now: number): { state: SequenceState; action: ShortcutAction } {
  // Ctrl, Cmd and Alt chords belong to the browser, the editor and the operating system.
  if (input.ctrlKey || input.metaKey || input.altKey) return { state: IDLE, action: { kind: "none" } };
  const pending = state.pending !== null && now - state.at <= SEQUENCE_TIMEOUT_MS ? state.pending : null;
  if (pending === "g") {
    const target = targets.find((t) => t.key === input.key);
    return { state: IDLE, action: target ? { kind: "go", href: target.href } : { kind: "none" } };
  }
  if (input.key === "?") return { state: IDLE, action: { kind: "help" } };
  if (input.key === "/") return { state: IDLE, action: { kind: "search" } };
  if (input.key === "g" && targets.length > 0) return { state: { pending: "g", at: now }, action: { kind: "wait" } };
  return { state: IDLE, action: { kind: "none" } };
}

export type FocusInfo = { tag: string; type?: string | null; editable?: boolean; inCodeEditor?: boolean };

const NON_TEXT_INPUTS = new Set(["checkbox", "radio", "button", "submit", "reset", "file", "range", "color", "image"]);

/** Whether key presses at this element are someone typing, so shortcuts must keep out of the way. */
export function isTypingTarget(info: FocusInfo): boolean {
  if (info.editable || info.inCodeEditor) return true;
  const tag = info.tag.toUpperCase();
  if (tag === "TEXTAREA" || tag === "SELECT") return true;
  if (tag === "INPUT") return !NON_TEXT_INPUTS.has((info.type ?? "text").toLowerCase());
  return false;
}

export type ShortcutRow = { keys: string[][]; what: string };
export type ShortcutGroup = { title: string; note?: string; rows: ShortcutRow[] };

/**
 * Every shortcut the console knows, for the overlay. `keys` lists alternatives; each is a sequence
 * of presses one after the other, and a press such as "Ctrl+S" is keys held together.
 */
export function shortcutGroups(targets: readonly GoTarget[]): ShortcutGroup[] {
  return [
    {
      title: "Anywhere in the console",
      note: "Not while you are typing in a field or in the text editor.",
      rows: [
        { keys: [["?"]], what: "Show this list" },
        { keys: [["/"]], what: "Jump to the page's search or filter field" },
        ...targets.map((t) => ({ keys: [["g", t.key]], what: `Go to ${t.label}` })),
        { keys: [["Esc"]], what: "Close a dialog, a menu or the tour" },
        { keys: [["F8"]], what: "Move to the latest notices" },
      ],
    },
    {
      title: "Profile editor",
      rows: [
        { keys: [["Ctrl+S"], ["⌘+S"]], what: "Save the revision" },
        { keys: [["Ctrl+Enter"], ["⌘+Enter"]], what: "Submit the revision for review" },
        { keys: [["←"], ["→"]], what: "Switch between Text and Fields (on the tabs)" },
      ],
    },
    {
      // Monaco's default bindings, read from monaco-editor 0.57's contributions.
      title: "Text view (the code editor's own keys)",
      rows: [
        { keys: [["Ctrl+Space"]], what: "Suggest parameter names and values" },
        { keys: [["Ctrl+F"], ["⌘+F"]], what: "Find in the document" },
        { keys: [["F1"]], what: "All editor commands" },
        { keys: [["Ctrl+M"], ["Ctrl+Shift+M"]], what: "Let Tab move focus out of the editor instead of indenting (the second on a Mac)" },
      ],
    },
    {
      title: "Guided tour",
      rows: [
        { keys: [["→"], ["←"]], what: "Next or previous step" },
        { keys: [["Esc"]], what: "End the tour" },
      ],
    },
  ];
}
