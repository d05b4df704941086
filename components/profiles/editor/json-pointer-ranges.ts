// Where each JSON Pointer of a document sits in its text, so schema issues and safety findings can be
// marked on the key or value they name. Monaco's own JSON parser lives in its worker and is not reachable
// from the page, hence this small scanner. Offsets are UTF-16 code-unit indexes, as Monaco's model uses.
import { childPointer } from "@/lib/profiles/json";

export type NodeRange = {
  pointer: string;
  /** The quoted key, for members of an object; absent for array items and the document itself. */
  key?: { start: number; end: number };
  value: { start: number; end: number };
  kind: "object" | "array" | "string" | "number" | "literal";
};

export type RangeIndex = { ok: true; nodes: Map<string, NodeRange> } | { ok: false; offset: number; message: string };

class ScanError extends Error {
  constructor(
    message: string,
    readonly offset: number,
  ) {
    super(message);
  }
}

const WHITESPACE = new Set([" ", "\t", "\n", "\r"]);
const NUMBER = /-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?/y;
const STRING_BODY = /"(?:[^"\\\u0000-\u001f]|\\(?:["\\/bfnrt]|u[0-9a-fA-F]{4}))*"/y;

class Scanner {
  pos = 0;
  readonly nodes = new Map<string, NodeRange>();
  constructor(readonly text: string) {}

  skip(): void {
    while (this.pos < this.text.length && WHITESPACE.has(this.text[this.pos]!)) this.pos++;
  }

  fail(message: string): never {
    throw new ScanError(message, this.pos);
  }

  expect(char: string): void {
    this.skip();
    if (this.text[this.pos] !== char) this.fail(`expected "${char}"${this.found()}`);
    this.pos++;
  }

  found(): string {
    return this.pos >= this.text.length ? " but the text ends" : ` but found "${this.text[this.pos]!}"`;
  }

  string(): { start: number; end: number; decoded: string } {
    const start = this.pos;
    STRING_BODY.lastIndex = start;
    const m = STRING_BODY.exec(this.text);
    if (!m) this.fail("a string is not closed, or holds a control character or a bad escape");
    this.pos = start + m[0].length;
    return { start, end: this.pos, decoded: JSON.parse(m[0]) as string };
  }

  value(pointer: string, key?: { start: number; end: number }): void {
    this.skip();
    const start = this.pos;
    const c = this.text[this.pos];
    let kind: NodeRange["kind"];
    if (c === "{") {
      kind = "object";
      this.object(pointer);
    } else if (c === "[") {
      kind = "array";
      this.array(pointer);
    } else if (c === '"') {
      kind = "string";
      this.string();
    } else if (c === "-" || (c !== undefined && c >= "0" && c <= "9")) {
      kind = "number";
      NUMBER.lastIndex = start;
      const m = NUMBER.exec(this.text);
      if (!m) this.fail("a number is malformed");
      this.pos = start + m[0].length;
    } else {
      kind = "literal";
      const word = ["true", "false", "null"].find((w) => this.text.startsWith(w, start));
      if (!word) this.fail(`expected a value${this.found()}`);
      this.pos = start + word.length;
    }
    // A repeated key: JSON.parse keeps the last one, and so does the index.
    this.nodes.set(pointer, { pointer, ...(key ? { key } : {}), value: { start, end: this.pos }, kind });
  }

  object(pointer: string): void {
    this.pos++;
    this.skip();
    if (this.text[this.pos] === "}") {
      this.pos++;
      return;
    }
    for (;;) {
      this.skip();
      if (this.text[this.pos] !== '"') this.fail(`expected a quoted key${this.found()}`);
      const key = this.string();
      this.expect(":");
      this.value(childPointer(pointer, key.decoded), { start: key.start, end: key.end });
      this.skip();
      const c = this.text[this.pos];
      if (c === ",") this.pos++;
      else if (c === "}") {
        this.pos++;
        return;
      } else this.fail(`expected "," or "}"${this.found()}`);
    }
  }

  array(pointer: string): void {
    this.pos++;
    this.skip();
    if (this.text[this.pos] === "]") {
      this.pos++;
      return;
    }
    for (let i = 0; ; i++) {
      this.value(`${pointer}/${i}`);
      this.skip();
      const c = this.text[this.pos];
      if (c === ",") this.pos++;
      else if (c === "]") {
        this.pos++;
        return;
      } else this.fail(`expected "," or "]"${this.found()}`);
    }
  }
}

/** Scans JSON text into the text range of every pointer; on a syntax error, where and what it is. */
export function indexRanges(text: string): RangeIndex {
  const scanner = new Scanner(text);
  try {
    scanner.value("");
    scanner.skip();
    if (scanner.pos < text.length) scanner.fail("unexpected text after the end of the document");
    return { ok: true, nodes: scanner.nodes };
  } catch (e) {
    if (e instanceof ScanError) return { ok: false, offset: e.offset, message: e.message };
    throw e;
  }
}

/** The parent pointers of a pointer, nearest first, ending with "" (the document). */
export function ancestorPointers(pointer: string): string[] {
  const out: string[] = [];
  let p = pointer;
  while (p !== "") {
    p = p.slice(0, p.lastIndexOf("/"));
    out.push(p);
  }
  return out;
}

export type MarkRange = { start: number; end: number; exact: boolean };

/**
 * The span to mark for a pointer: a scalar's value, a group's key (not the whole block), or the opening
 * bracket of the document. A pointer missing from the text falls back to its nearest present ancestor,
 * with `exact` false; null only when the text does not parse. `key` marks a member's key instead
 * (an unknown key is the problem, not its value).
 */
export function markRange(index: RangeIndex, pointer: string, options: { key?: boolean } = {}): MarkRange | null {
  if (!index.ok) return null;
  for (const [i, p] of [pointer, ...ancestorPointers(pointer)].entries()) {
    const node = index.nodes.get(p);
    if (!node) continue;
    const exact = i === 0;
    if (options.key && exact && node.key) return { ...node.key, exact };
    if (node.kind !== "object" && node.kind !== "array") return { ...node.value, exact };
    if (node.key) return { ...node.key, exact };
    return { start: node.value.start, end: node.value.start + 1, exact };
  }
  return null;
}

/** The deepest pointer whose key or value covers the offset (the cursor sits on it or just after it). */
export function pointerAtOffset(index: RangeIndex, offset: number): string | null {
  if (!index.ok) return null;
  let best: NodeRange | null = null;
  for (const node of index.nodes.values()) {
    const start = node.key?.start ?? node.value.start;
    if (offset < start || offset > node.value.end) continue;
    if (!best || node.pointer.length > best.pointer.length) best = node;
  }
  return best?.pointer ?? null;
}
