/**
 * A bounded in-process cache that lets the least recently used values go first. Each value weighs
 * `weigh(value)` (1 by default, so the bound is a count); a value heavier than `maxValueWeight` is not
 * kept, so one large value cannot push out all the others. Only for values that cannot go stale: the key
 * (or a check against what is stored) must name exactly what the value was computed from.
 */
export class LruCache<K, V> {
  private readonly values = new Map<K, V>();
  private weight = 0;

  constructor(
    private readonly maxWeight: number,
    private readonly weigh: (value: V) => number = () => 1,
    private readonly maxValueWeight = maxWeight,
  ) {}

  get(key: K): V | undefined {
    const value = this.values.get(key);
    if (value === undefined) return undefined;
    // Most recently used last, so the least recently used is the first to go.
    this.values.delete(key);
    this.values.set(key, value);
    return value;
  }

  set(key: K, value: V): void {
    this.delete(key);
    const weight = this.weigh(value);
    if (weight > this.maxValueWeight) return;
    this.values.set(key, value);
    this.weight += weight;
    for (const oldest of this.values.keys()) {
      if (this.weight <= this.maxWeight) break;
      this.delete(oldest);
    }
  }

  delete(key: K): void {
    const value = this.values.get(key);
    if (value === undefined) return;
    this.values.delete(key);
    this.weight -= this.weigh(value);
  }

  /** How many values are kept, and their total weight. */
  get size(): { count: number; weight: number } {
    return { count: this.values.size, weight: this.weight };
  }
}
