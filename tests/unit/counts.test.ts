import { describe, expect, it } from 'vitest';
import { countOf } from '@shared/format/counts';

describe('a count with its noun', () => {
  it('says "1 reading", never "1 readings"', () => {
    expect(countOf(1, 'reading')).toBe('1 reading');
    expect(countOf(3, 'reading')).toBe('3 readings');
    expect(countOf(0, 'reading')).toBe('0 readings');
    expect(countOf(1, 'entry', 'entries')).toBe('1 entry');
    expect(countOf(2, 'entry', 'entries')).toBe('2 entries');
    expect(countOf(1200, 'mile')).toBe('1,200 miles');
  });
});
