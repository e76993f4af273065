/**
 * A per-process cache of rarely changing reads (shop settings, the signed-in
 * user, a bake day's menu and windows) that every request would otherwise
 * fetch again. Entries live READ_CACHE_MS (2 s by default, 0 under test), so
 * a change made by another API process is seen within that time; a change
 * made here forgets the entry at once. Concurrent misses share one load.
 */
export class ReadCache<V> {
  private readonly entries = new Map<string, { at: number; value: Promise<V> }>();
  static ttlMs = 0;

  async get(key: string, load: () => Promise<V>): Promise<V> {
    const ttl = ReadCache.ttlMs;
    if (ttl <= 0) return load();
    const now = Date.now();
    const hit = this.entries.get(key);
    if (hit && now - hit.at < ttl) return hit.value;
    if (this.entries.size > 10_000) this.entries.clear();
    const value = load();
    this.entries.set(key, { at: now, value });
    value.catch(() => this.entries.delete(key));
    return value;
  }

  forget(key?: string): void {
    if (key === undefined) this.entries.clear();
    else this.entries.delete(key);
  }
}
