// What one app process remembers between device polls, so that a steady-state poll costs the single
// token lookup. Nothing here is trusted across a change: entries are keyed by the configuration
// generation (bumped in every release transaction, read by every instance on every poll) and by the
// controller's own fields (read in the same lookup), so a release, or a controller moved to another
// site, model or parameter set, is served at once by every instance.

/** A Map that forgets its oldest entries beyond `limit`, so memory stays bounded for any fleet. */
export class BoundedMap<K, V> {
  private readonly map = new Map<K, V>();
  constructor(private readonly limit: number) {}

  get(key: K): V | undefined {
    return this.map.get(key);
  }

  set(key: K, value: V): void {
    this.map.delete(key);
    this.map.set(key, value);
    while (this.map.size > this.limit) this.map.delete(this.map.keys().next().value as K);
  }

  clear(): void {
    this.map.clear();
  }

  get size(): number {
    return this.map.size;
  }
}

/**
 * Remembers values computed under one generation; the first lookup under a newer generation drops
 * everything, because any of it may have changed.
 */
export class GenerationCache<V> {
  private generation = -1;
  private readonly entries: BoundedMap<string, V>;
  constructor(limit: number) {
    this.entries = new BoundedMap(limit);
  }

  /** The value for `key` under `generation`, computing (and remembering) it when missing. */
  async get(generation: number, key: string, compute: () => Promise<V>): Promise<V> {
    if (generation !== this.generation) {
      // An older generation arriving late (a slow request) computes without disturbing newer entries.
      if (generation < this.generation) return compute();
      this.entries.clear();
      this.generation = generation;
    }
    const hit = this.entries.get(key);
    if (hit !== undefined) return hit;
    const value = await compute();
    if (generation === this.generation) this.entries.set(key, value);
    return value;
  }

  get size(): number {
    return this.entries.size;
  }
}
