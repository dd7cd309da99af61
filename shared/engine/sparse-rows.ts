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
    // Indexed loops, and the arrays cut back only when a term merged or summed to zero: a programme adds
    // thousands of rows each time it is built.
    const { indices, values } = this;
    const start = indices.length;
    let end = start;
    for (let t = 0; t < terms.length; t++) {
      const col = terms[t][0];
      let at = start;
      while (at < end && indices[at] !== col) at++;
      if (at === end) {
        indices.push(col);
        values.push(terms[t][1]);
        end++;
      } else values[at] += terms[t][1];
    }
    let kept = start;
    for (let at = start; at < end; at++) {
      if (values[at] === 0) continue;
      indices[kept] = indices[at];
      values[kept++] = values[at];
    }
    if (kept !== end) indices.length = values.length = kept;
    this.starts.push(kept);
    this.lower.push(lower);
    this.upper.push(upper);
  }
}
