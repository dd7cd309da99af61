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
    const merged = new Map<number, number>();
    for (const [col, k] of terms) merged.set(col, (merged.get(col) ?? 0) + k);
    for (const [col, k] of merged) {
      if (k === 0) continue;
      this.indices.push(col);
      this.values.push(k);
    }
    this.starts.push(this.indices.length);
    this.lower.push(lower);
    this.upper.push(upper);
  }
}
