import { describe, expect, it } from 'vitest';
import { formatDay, formatMoment, formatTime } from '../../shared/format/when';

describe('dates and times as people read them', () => {
  it('says a day as "Dec 2, 2026" and a time as "9:30 AM" with a plain space', () => {
    const at = new Date('2026-12-02T14:30:00Z');
    expect(formatDay(at, 'UTC')).toBe('Dec 2, 2026');
    expect(formatTime(at, 'America/New_York')).toBe('9:30 AM');
    expect(formatMoment(at, 'America/New_York')).toBe('Dec 2, 2026 at 9:30 AM');
  });

  it('reads a plain day as that calendar day wherever the reader is', () => {
    expect(formatDay('2026-12-02', 'Pacific/Honolulu')).toBe('Dec 2, 2026');
    expect(formatDay('2026-12-02')).toBe('Dec 2, 2026');
  });
});
