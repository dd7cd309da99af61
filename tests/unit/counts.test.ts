import { describe, expect, it } from 'vitest';
import { countOf, quantityWithUnit } from '@shared/format/counts';

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

describe('a quote line’s quantity with its unit', () => {
  it('says "1 truck load" and "1 ton", never "1 truck loads"', () => {
    expect(quantityWithUnit(1, 'truck loads')).toBe('1 truck load');
    expect(quantityWithUnit(4, 'truck loads')).toBe('4 truck loads');
    expect(quantityWithUnit(4, 'truck load')).toBe('4 truck loads');
    expect(quantityWithUnit(1, 'tons')).toBe('1 ton');
    expect(quantityWithUnit(2.5, 'tons')).toBe('2.50 tons');
    // Abbreviations and words with no plural read as typed.
    expect(quantityWithUnit(1, 'bank cu yd')).toBe('1 bank cu yd');
    expect(quantityWithUnit(12.25, 'sq ft')).toBe('12.25 sq ft');
    expect(quantityWithUnit(1, 'each')).toBe('1 each');
    expect(quantityWithUnit(1, 'hours')).toBe('1 hour');
    expect(quantityWithUnit(3, 'crew day')).toBe('3 crew days');
  });
});
