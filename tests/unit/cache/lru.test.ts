import { describe, expect, it } from "vitest";
import { LruCache } from "@/lib/cache/lru";

describe("LruCache", () => {
  it("drops the least recently used entry past the entry limit", () => {
    const c = new LruCache<string, number>({ maxEntries: 2, maxBytes: 1_000 });
    c.set("a", 1);
    c.set("b", 2);
    expect(c.get("a")).toBe(1); // a is now the most recent
    c.set("c", 3);
    expect(c.get("b")).toBeUndefined();
    expect(c.get("a")).toBe(1);
    expect(c.get("c")).toBe(3);
    expect(c.size).toBe(2);
  });

  it("keeps the total size within the byte budget and refuses a value larger than all of it", () => {
    const c = new LruCache<string, string>({ maxEntries: 10, maxBytes: 100 });
    c.set("a", "x", 60);
    c.set("b", "y", 30);
    c.set("c", "z", 30); // 120 > 100: a goes
    expect(c.get("a")).toBeUndefined();
    expect(c.totalBytes).toBe(60);
    c.set("huge", "w", 101);
    expect(c.get("huge")).toBeUndefined();
    expect(c.totalBytes).toBe(60);
  });

  it("replacing a key counts its size once", () => {
    const c = new LruCache<string, number>({ maxEntries: 10, maxBytes: 100 });
    c.set("a", 1, 40);
    c.set("a", 2, 50);
    expect(c.totalBytes).toBe(50);
    expect(c.get("a")).toBe(2);
    c.delete("a");
    expect(c.totalBytes).toBe(0);
  });
});
