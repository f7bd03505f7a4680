// Candidates indexed by amount, then by day, so that each bank line finds its nearest free
// candidate in about O(log n): no bank line is ever compared with every book item.

type Bucket = {
  days: number[];
  /** Candidate ids per day, in the order they were added. */
  queues: number[][];
  heads: number[];
  /** Disjoint-set "next non-empty day" pointers, to the right and to the left (shifted by one). */
  right: number[];
  left: number[];
};

function find(parent: number[], i: number): number {
  let root = i;
  while (parent[root] !== root) root = parent[root] ?? root;
  let node = i;
  while (parent[node] !== root) {
    const next = parent[node] ?? root;
    parent[node] = root;
    node = next;
  }
  return root;
}

function lowerBound(days: readonly number[], day: number): number {
  let lo = 0;
  let hi = days.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if ((days[mid] ?? 0) < day) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

export class DayIndex {
  private readonly pending = new Map<number, { day: number; id: number }[]>();
  private readonly buckets = new Map<number, Bucket>();

  constructor(private readonly isFree: (id: number) => boolean) {}

  add(amount: number, day: number, id: number): void {
    const list = this.pending.get(amount) ?? [];
    list.push({ day, id });
    this.pending.set(amount, list);
  }

  private bucketOf(amount: number): Bucket | undefined {
    const built = this.buckets.get(amount);
    if (built) return built;
    const list = this.pending.get(amount);
    if (!list) return undefined;
    // Stable sort: ids on the same day stay in the order they were added.
    const sorted = [...list].sort((a, b) => a.day - b.day);
    const bucket: Bucket = { days: [], queues: [], heads: [], right: [], left: [] };
    for (const { day, id } of sorted) {
      if (bucket.days[bucket.days.length - 1] === day) bucket.queues[bucket.queues.length - 1]?.push(id);
      else {
        bucket.days.push(day);
        bucket.queues.push([id]);
        bucket.heads.push(0);
      }
    }
    const n = bucket.days.length;
    bucket.right = Array.from({ length: n + 1 }, (_, i) => i);
    bucket.left = Array.from({ length: n + 1 }, (_, i) => i);
    this.buckets.set(amount, bucket);
    return bucket;
  }

  /** First free id on slot i, dropping used ones; undefined (and the slot retired) when none. */
  private headOf(b: Bucket, i: number): number | undefined {
    const queue = b.queues[i] ?? [];
    let head = b.heads[i] ?? 0;
    while (head < queue.length && !this.isFree(queue[head] ?? -1)) head++;
    b.heads[i] = head;
    if (head < queue.length) return queue[head];
    b.right[i] = i + 1;
    b.left[i + 1] = i;
    return undefined;
  }

  private nearestRight(b: Bucket, from: number): number | undefined {
    for (let i = find(b.right, from); i < b.days.length; i = find(b.right, i)) {
      if (this.headOf(b, i) !== undefined) return i;
    }
    return undefined;
  }

  private nearestLeft(b: Bucket, from: number): number | undefined {
    // left[] is shifted by one so that index 0 is the "nothing further left" sentinel.
    for (let s = find(b.left, from + 1); s > 0; s = find(b.left, s)) {
      if (this.headOf(b, s - 1) !== undefined) return s - 1;
    }
    return undefined;
  }

  /**
   * The free id with this amount whose day is nearest `day`, no more than `before` days
   * earlier and no more than `after` days later; on a tie the earlier day wins, then the id
   * added first. The caller marks it used.
   */
  nearest(amount: number, day: number, before: number, after: number): number | undefined {
    const b = this.bucketOf(amount);
    if (!b) return undefined;
    const pos = lowerBound(b.days, day);
    const r = this.nearestRight(b, pos);
    const l = pos > 0 ? this.nearestLeft(b, pos - 1) : undefined;
    const lOk = l !== undefined && day - (b.days[l] ?? 0) <= before;
    const rOk = r !== undefined && (b.days[r] ?? 0) - day <= after;
    let pick: number | undefined;
    if (lOk && rOk) pick = day - (b.days[l] ?? 0) <= (b.days[r] ?? 0) - day ? l : r;
    else pick = lOk ? l : rOk ? r : undefined;
    if (pick === undefined) return undefined;
    return this.headOf(b, pick);
  }
}
