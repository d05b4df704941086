// Staged releases: each controller has a fixed bucket 0–99, and a release at p % reaches the buckets
// below p. The bucket depends on the serial alone, so widening a release from 10 % to 50 % to 100 %
// only ever adds controllers, and the same serial lands in the same bucket in the browser, on the
// server and in scripts (a pure-JS SHA-256, as for content hashes).
//
// Bucket = first 4 bytes of SHA-256(UTF-8 serial) as a big-endian unsigned integer, mod 100. 2^32 is
// 42,949,672 × 100 + 96, so buckets 0–95 each have one value more out of about 43 million than
// buckets 96–99: a bias of 2.3 in 100 million, far below anything a fleet of controllers could show.
// Serials are hashed exactly as given; callers pass the registered (upper-case) serial.
import { sha256 } from "@noble/hashes/sha2.js";
import { utf8ToBytes } from "@noble/hashes/utils.js";

export const STAGE_BUCKETS = 100;

/** The controller's fixed stage bucket, 0–99, from the SHA-256 of its serial. */
export function stageBucket(serial: string): number {
  const h = sha256(utf8ToBytes(serial));
  const first = ((h[0]! << 24) | (h[1]! << 16) | (h[2]! << 8) | h[3]!) >>> 0;
  return first % STAGE_BUCKETS;
}

/** Whether a release at `percent` % (0–100) reaches the controller: its bucket is below the percentage. */
export function inStage(serial: string, percent: number): boolean {
  if (!(percent >= 0 && percent <= 100)) throw new RangeError(`percent must be between 0 and 100, got ${percent}`);
  return stageBucket(serial) < percent;
}
