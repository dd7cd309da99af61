import { describe, expect, it } from 'vitest';
import { SparseRows } from '@shared/engine/sparse-rows';

// Plain bookkeeping of the solver's input (no published source needed): the rows go to HiGHS as written here.
describe('sparse rows', () => {
  it('sums a column named twice in one row, drops a coefficient that sums to zero, and keeps rows apart', () => {
    const rows = new SparseRows();
    rows.add(
      [
        [3, 1],
        [1, 2],
        [3, 0.5],
      ],
      0,
      4,
    );
    rows.add(
      [
        [2, 1],
        [2, -1],
        [5, 7],
      ],
      -Infinity,
      1,
    );
    rows.add([[1, 0]], 0, 0);
    expect(rows.count).toBe(3);
    expect(rows.starts).toEqual([0, 2, 3, 3]);
    expect(rows.indices).toEqual([3, 1, 5]);
    expect(rows.values).toEqual([1.5, 2, 7]);
    expect(rows.lower).toEqual([0, -Infinity, 0]);
    expect(rows.upper).toEqual([4, 1, 0]);
  });
});
