/**
 * Chains waiting for their next layer, ordered by (earliest start, chain index) so the
 * scheduler finds the next layer to start without scanning every surface each time.
 */
export class StartQueue {
  private readonly heap: number[] = [];

  constructor(private readonly startOf: ArrayLike<number>) {}

  get size(): number {
    return this.heap.length;
  }

  /** chain index at the top, or -1 */
  peek(): number {
    return this.heap.length > 0 ? this.heap[0] : -1;
  }

  push(chain: number): void {
    const h = this.heap;
    h.push(chain);
    let i = h.length - 1;
    while (i > 0) {
      const parent = (i - 1) >> 1;
      if (!this.before(h[i], h[parent])) break;
      // Swapped through a local: destructuring swaps allocate an array in unoptimised code.
      const swap = h[i];
      h[i] = h[parent];
      h[parent] = swap;
      i = parent;
    }
  }

  pop(): number {
    const h = this.heap;
    const top = h[0];
    const last = h.pop() as number;
    if (h.length > 0) {
      h[0] = last;
      let i = 0;
      for (;;) {
        const l = 2 * i + 1;
        const r = l + 1;
        let m = i;
        if (l < h.length && this.before(h[l], h[m])) m = l;
        if (r < h.length && this.before(h[r], h[m])) m = r;
        if (m === i) break;
        const swap = h[i];
        h[i] = h[m];
        h[m] = swap;
        i = m;
      }
    }
    return top;
  }

  private before(a: number, b: number): boolean {
    const sa = this.startOf[a];
    const sb = this.startOf[b];
    return sa < sb || (sa === sb && a < b);
  }
}
