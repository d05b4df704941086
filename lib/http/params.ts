import { AppError } from "./errors";

/** A positive whole-number id from a URL segment; 404 for anything else (it cannot name a row). */
export function idParam(value: string, what: string): number {
  const n = Number(value);
  if (!/^\d{1,10}$/.test(value) || !Number.isSafeInteger(n) || n <= 0) throw new AppError("not_found", `No such ${what}.`);
  return n;
}
