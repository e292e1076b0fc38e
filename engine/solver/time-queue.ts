/**
 * Partitions ordered by their own time (ties by index, so the order is
 * deterministic), in a binary heap that allows any member's time to move in
 * either direction: a partition steps forward, or is undone one step back.
 */
export class TimeQueue {
  private readonly heap: Int32Array;
  private readonly at: Int32Array;
  /** The members, whose times are read directly: a callback cost a call at each of the comparisons every step makes. */
  private readonly members: ReadonlyArray<{ readonly time: number }>;

  constructor(members: ReadonlyArray<{ readonly time: number }>) {
    this.members = members;
    const size = members.length;
    this.heap = Int32Array.from({ length: size }, (_, i) => i);
    this.at = Int32Array.from({ length: size }, (_, i) => i);
    for (let i = (size >> 1) - 1; i >= 0; i -= 1) this.down(i);
  }

  /** The partition furthest behind (-1 when there is none). */
  top(): number {
    return this.heap.length ? this.heap[0]! : -1;
  }

  /** Restores the order after `index`'s time changed. */
  update(index: number): void {
    const position = this.at[index]!;
    this.up(position);
    this.down(this.at[index]!);
  }

  private before(a: number, b: number): boolean {
    const ta = this.members[a]!.time;
    const tb = this.members[b]!.time;
    return ta < tb || (ta === tb && a < b);
  }

  private swap(i: number, j: number): void {
    const a = this.heap[i]!;
    const b = this.heap[j]!;
    this.heap[i] = b;
    this.heap[j] = a;
    this.at[b] = i;
    this.at[a] = j;
  }

  private up(position: number): void {
    let i = position;
    while (i > 0) {
      const parent = (i - 1) >> 1;
      if (!this.before(this.heap[i]!, this.heap[parent]!)) return;
      this.swap(i, parent);
      i = parent;
    }
  }

  private down(position: number): void {
    const n = this.heap.length;
    let i = position;
    for (;;) {
      const l = 2 * i + 1;
      const r = l + 1;
      let m = i;
      if (l < n && this.before(this.heap[l]!, this.heap[m]!)) m = l;
      if (r < n && this.before(this.heap[r]!, this.heap[m]!)) m = r;
      if (m === i) return;
      this.swap(i, m);
      i = m;
    }
  }
}
