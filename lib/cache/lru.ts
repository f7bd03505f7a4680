// A bounded least-recently-used map: at most `maxEntries` entries and about `maxBytes` of
// values (each entry says its own size), so a server that many clubs share keeps a fixed
// ceiling on what it holds, whatever the number of clubs. Pure: no framework, no database.

export class LruCache<K, V> {
  private readonly map = new Map<K, { value: V; bytes: number }>();
  private bytes = 0;

  constructor(private readonly limits: { maxEntries: number; maxBytes: number }) {
    if (limits.maxEntries < 1 || limits.maxBytes < 1) throw new RangeError("An LRU cache needs room for at least one entry");
  }

  get size(): number {
    return this.map.size;
  }

  get totalBytes(): number {
    return this.bytes;
  }

  /** The value, now the most recently used; undefined when absent. */
  get(key: K): V | undefined {
    const hit = this.map.get(key);
    if (!hit) return undefined;
    this.map.delete(key);
    this.map.set(key, hit);
    return hit.value;
  }

  /** Stores a value of about `bytes` size; one larger than the whole budget is not kept at all. */
  set(key: K, value: V, bytes = 0): void {
    this.delete(key);
    if (bytes > this.limits.maxBytes) return;
    this.map.set(key, { value, bytes });
    this.bytes += bytes;
    for (const [oldest, entry] of this.map) {
      if (this.map.size <= this.limits.maxEntries && this.bytes <= this.limits.maxBytes) break;
      this.map.delete(oldest);
      this.bytes -= entry.bytes;
    }
  }

  delete(key: K): void {
    const hit = this.map.get(key);
    if (!hit) return;
    this.map.delete(key);
    this.bytes -= hit.bytes;
  }

  clear(): void {
    this.map.clear();
    this.bytes = 0;
  }
}
