/**
 * A Storage in memory for tests, with an optional quota in characters (keys and values counted as
 * the browser counts them): a write past it throws the browser's QuotaExceededError.
 */
export class MemoryStorage implements Storage {
  private data = new Map<string, string>();
  /** Characters written per key, to see what a load wrote. */
  writes = 0;
  private quota: number;
  constructor(quota = Number.POSITIVE_INFINITY) {
    this.quota = quota;
  }
  get length() {
    return this.data.size;
  }
  get used() {
    let n = 0;
    for (const [k, v] of this.data) n += k.length + v.length;
    return n;
  }
  clear() {
    this.data.clear();
  }
  getItem(key: string) {
    return this.data.get(key) ?? null;
  }
  key(index: number) {
    return [...this.data.keys()][index] ?? null;
  }
  keys() {
    return [...this.data.keys()];
  }
  removeItem(key: string) {
    this.data.delete(key);
  }
  setItem(key: string, value: string) {
    const after = this.used - (this.data.has(key) ? key.length + this.data.get(key)!.length : 0) + key.length + value.length;
    if (after > this.quota) throw new DOMException("The quota has been exceeded.", "QuotaExceededError");
    this.writes += 1;
    this.data.set(key, String(value));
  }
}
