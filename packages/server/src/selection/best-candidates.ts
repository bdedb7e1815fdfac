/**
 * The best `capacity` candidates of a stream, without sorting the whole stream: a binary heap
 * of indices (typed array, allocated once) whose root is the worst kept candidate.
 * `better(a, b)` is true when candidate a ranks above candidate b.
 */
export class BestCandidates {
  private readonly heap: Int32Array;
  private size = 0;

  constructor(
    readonly capacity: number,
    private readonly better: (a: number, b: number) => boolean,
  ) {
    this.heap = new Int32Array(Math.max(capacity, 1));
  }

  get count(): number {
    return this.size;
  }

  offer(candidate: number): void {
    if (this.capacity <= 0) return;
    if (this.size < this.capacity) {
      this.heap[this.size] = candidate;
      this.siftUp(this.size++);
    } else if (this.better(candidate, this.heap[0])) {
      this.heap[0] = candidate;
      this.siftDown(0);
    }
  }

  /** The kept candidates, best first. */
  sorted(): number[] {
    return Array.from(this.heap.subarray(0, this.size)).sort((a, b) => (this.better(a, b) ? -1 : this.better(b, a) ? 1 : 0));
  }

  /** Heap order: the parent ranks below (is worse than) its children. */
  private worse(a: number, b: number): boolean {
    return this.better(b, a);
  }

  private siftUp(i: number): void {
    const h = this.heap;
    while (i > 0) {
      const parent = (i - 1) >> 1;
      if (!this.worse(h[i], h[parent])) break;
      const t = h[i];
      h[i] = h[parent];
      h[parent] = t;
      i = parent;
    }
  }

  private siftDown(i: number): void {
    const h = this.heap;
    for (;;) {
      const l = 2 * i + 1;
      const r = l + 1;
      let m = i;
      if (l < this.size && this.worse(h[l], h[m])) m = l;
      if (r < this.size && this.worse(h[r], h[m])) m = r;
      if (m === i) return;
      const t = h[i];
      h[i] = h[m];
      h[m] = t;
      i = m;
    }
  }
}
