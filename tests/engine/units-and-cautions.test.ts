import { describe, expect, it } from 'vitest';
import { checkEntrance, commonRuralTemplate, displayLength, displaySmallLength, SAFETY_CAUTIONS } from '@shared/engine';
import { profileFromRuns } from './fixtures';

// 1 ft = 0.3048 m and 1 in = 25.4 mm exactly: the international yard and pound agreement (1959), from memory.
describe('metric display', () => {
  it('converts by the exact definitions 1 ft = 0.3048 m and 1 in = 25.4 mm', () => {
    expect(displayLength(100, 'metric')).toEqual({ value: 30.48, unit: 'm' });
    expect(displayLength(100, 'us')).toEqual({ value: 100, unit: 'ft' });
    expect(displaySmallLength(12, 'metric').value).toBeCloseTo(304.8, 9);
  });
});

describe('cautions on the report (docs/sources.md, "Product rules": our own, no published source)', () => {
  it('every check report carries the utility, trench, traffic and review reminders', () => {
    const r = checkEntrance(
      {
        profile: profileFromRuns([
          [20, 2],
          [30, 6],
        ]),
      },
      commonRuralTemplate,
    );
    expect(r.cautions).toBe(SAFETY_CAUTIONS);
    const text = r.cautions.join(' ');
    for (const word of ['utilities', 'trench', 'traffic control', 'licensed engineer']) expect(text).toContain(word);
  });
});
