/**
 * Chains whose next layer may start now, answering the scheduler's two questions in O(log n)
 * instead of a scan over every ready surface: which ready chain is listed first, and which is
 * the first listed whose next layer takes no longer than a given time. A min-tree over chain
 * indices holds each ready chain's next duration; chains not ready hold +Infinity.
 */
export class ReadySet {
  private readonly tree: Float64Array;
  private readonly leaves: number;
  private count = 0;

  constructor(chainCount: number) {
    let leaves = 1;
    while (leaves < chainCount) leaves *= 2;
    this.leaves = leaves;
    this.tree = new Float64Array(2 * leaves).fill(Infinity);
  }

  get size(): number {
    return this.count;
  }

  /** Marks a chain ready, with the duration of its next layer (finite, at least 0). */
  add(chain: number, duration: number): void {
    this.count++;
    this.set(chain, duration);
  }

  remove(chain: number): void {
    this.count--;
    this.set(chain, Infinity);
  }

  /** The ready chain listed first, or -1. */
  first(): number {
    return this.firstAtMost(Number.MAX_VALUE);
  }

  /** The first-listed ready chain whose next layer takes at most `limit` hours, or -1. */
  firstAtMost(limit: number): number {
    const t = this.tree;
    if (!(t[1] <= limit)) return -1;
    let i = 1;
    while (i < this.leaves) {
      i *= 2;
      if (!(t[i] <= limit)) i++;
    }
    return i - this.leaves;
  }

  private set(chain: number, value: number): void {
    const t = this.tree;
    let i = chain + this.leaves;
    t[i] = value;
    for (i >>= 1; i >= 1; i >>= 1) {
      const m = t[2 * i] < t[2 * i + 1] ? t[2 * i] : t[2 * i + 1];
      // An unchanged minimum leaves every node above it unchanged too.
      if (t[i] === m) return;
      t[i] = m;
    }
  }
}
