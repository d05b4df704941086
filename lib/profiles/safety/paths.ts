// Findings are worked out on version 2; a version 1 document gets its own paths back.
import { V1_TO_V2_PATHS, V1_TO_V2_SCHEDULE_KEYS } from "../migrate";

const V2_TO_V1 = new Map<string, string>();
for (const [v1, v2] of Object.entries(V1_TO_V2_PATHS)) V2_TO_V1.set(`/${v2.join("/")}`, `/${v1}`);
for (const [v1, v2] of Object.entries(V1_TO_V2_SCHEDULE_KEYS)) V2_TO_V1.set(`/schedule/${v2}`, `/schedule/${v1}`);

/** The version 1 pointer for a version 2 pointer, or null for a v2-only parameter (such as /stall/reopenOnStall). */
export function v2PathToV1(path: string): string | null {
  return V2_TO_V1.get(path) ?? null;
}

/** Pointers in the version asked for; version 2 ones unchanged, version 1 ones mapped (v2-only ones dropped). */
export function pathsFor(version: 1 | 2, paths: readonly string[]): string[] {
  if (version === 2) return [...paths];
  return paths.map(v2PathToV1).filter((p): p is string => p !== null);
}
