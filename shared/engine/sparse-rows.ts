/** Linear rows lower <= a.x <= upper collected in compressed sparse row form, as the solver takes them. */
export class SparseRows {
  readonly starts: number[] = [0];
  readonly indices: number[] = [];
  readonly values: number[] = [];
  readonly lower: number[] = [];
  readonly upper: number[] = [];

  get count(): number {
    return this.lower.length;
  }

  /** Terms as [column, coefficient]; a column named twice has its coefficients summed. */
  add(terms: readonly (readonly [number, number])[], lower: number, upper: number): void {
    // Rows hold a handful of terms, so a scan of the row so far merges repeats faster than a map per row.
    const start = this.indices.length;
    for (const [col, k] of terms) {
      let at = start;
      while (at < this.indices.length && this.indices[at] !== col) at++;
      if (at === this.indices.length) {
        this.indices.push(col);
        this.values.push(k);
      } else this.values[at] += k;
    }
    let kept = start;
    for (let at = start; at < this.indices.length; at++) {
      if (this.values[at] === 0) continue;
      this.indices[kept] = this.indices[at];
      this.values[kept++] = this.values[at];
    }
    this.indices.length = this.values.length = kept;
    this.starts.push(kept);
    this.lower.push(lower);
    this.upper.push(upper);
  }
}
