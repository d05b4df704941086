// Canonical JSON and content hashes for parameter documents. A revision's hash must come out the
// same in the browser, on the server and in scripts, so this uses a pure-JS SHA-256, not node:crypto.
import { sha256 } from "@noble/hashes/sha2.js";
import { bytesToHex, utf8ToBytes } from "@noble/hashes/utils.js";
import { childPointer } from "./json";

export class CanonicalJsonError extends Error {
  constructor(
    message: string,
    readonly path: string,
  ) {
    super(message);
    this.name = "CanonicalJsonError";
  }
}

const where = (path: string) => (path === "" ? "the document" : path);

function write(value: unknown, path: string, out: string[]): void {
  if (value === null || typeof value === "boolean") {
    out.push(String(value));
    return;
  }
  if (typeof value === "string") {
    out.push(JSON.stringify(value));
    return;
  }
  if (typeof value === "number") {
    if (!Number.isFinite(value)) {
      throw new CanonicalJsonError(`${where(path)} is ${String(value)}; JSON has finite numbers only`, path);
    }
    out.push(JSON.stringify(value));
    return;
  }
  if (Array.isArray(value)) {
    out.push("[");
    for (let i = 0; i < value.length; i++) {
      if (i > 0) out.push(",");
      // Sparse arrays have holes that JSON.stringify would quietly turn into null.
      const item = childPointer(path, String(i));
      if (!(i in value)) throw new CanonicalJsonError(`${item} is missing (a hole in the list)`, item);
      write(value[i], item, out);
    }
    out.push("]");
    return;
  }
  if (typeof value === "object") {
    const proto = Object.getPrototypeOf(value);
    if (proto !== Object.prototype && proto !== null) {
      throw new CanonicalJsonError(`${where(path)} is not a plain object (${proto?.constructor?.name ?? "unknown"})`, path);
    }
    const record = value as Record<string, unknown>;
    // Default sort compares UTF-16 code units, the key order RFC 8785 prescribes.
    const keys = Object.keys(record).sort();
    out.push("{");
    keys.forEach((key, i) => {
      if (i > 0) out.push(",");
      out.push(JSON.stringify(key), ":");
      write(record[key], childPointer(path, key), out);
    });
    out.push("}");
    return;
  }
  throw new CanonicalJsonError(`${where(path)} is ${value === undefined ? "undefined" : `a ${typeof value}`}, which JSON cannot hold`, path);
}

/** Canonical JSON: keys sorted recursively, no whitespace; refuses NaN, Infinity, undefined and non-JSON values. */
export function canonicalJson(value: unknown): string {
  const out: string[] = [];
  write(value, "", out);
  return out.join("");
}

/** SHA-256 (lower-case hex) of a string's UTF-8 bytes. */
export function sha256Hex(text: string): string {
  return bytesToHex(sha256(utf8ToBytes(text)));
}

/** The content hash of a document: SHA-256 hex over its canonical JSON in UTF-8. */
export function contentHash(value: unknown): string {
  return sha256Hex(canonicalJson(value));
}
