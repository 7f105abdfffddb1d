/**
 * A small least-recently-used map. Age model results are immutable once a run has succeeded,
 * so whatever is derived from a run can be kept by run id for as long as memory allows.
 */
export class RunCache<V> {
  private readonly entries = new Map<string, V>();

  constructor(readonly capacity: number) {
    if (!(capacity >= 1)) throw new RangeError(`capacity must be at least 1, got ${capacity}`);
  }

  get size(): number {
    return this.entries.size;
  }

  /** The value for `key`, marking it most recently used. */
  get(key: string): V | undefined {
    const value = this.entries.get(key);
    if (value === undefined) return undefined;
    this.entries.delete(key);
    this.entries.set(key, value);
    return value;
  }

  /** Store `value`, dropping the least recently used entry when full. */
  set(key: string, value: V): void {
    this.entries.delete(key);
    this.entries.set(key, value);
    if (this.entries.size > this.capacity) {
      const oldest = this.entries.keys().next().value as string;
      this.entries.delete(oldest);
    }
  }
}
