import { describe, expect, it } from 'vitest';
import { formatDay, formatMoment, formatTime, todayIso } from '@shared/format/dates';

describe('the one way dates are written', () => {
  it('writes a calendar day as "Dec 2, 2026", the same in every time zone', () => {
    expect(formatDay('2026-12-02')).toBe('Dec 2, 2026');
    expect(formatDay('2026-12-02', { timeZone: 'Pacific/Kiritimati' })).toBe('Dec 2, 2026');
    expect(formatDay('2026-12-02', { timeZone: 'Pacific/Pago_Pago' })).toBe('Dec 2, 2026');
  });

  it('adds the weekday when asked', () => {
    expect(formatDay('2026-12-02', { weekday: true })).toBe('Wed, Dec 2, 2026');
  });

  it('reads a moment in the time zone given', () => {
    const at = '2026-12-03T02:30:00Z';
    expect(formatDay(at, { timeZone: 'America/New_York' })).toBe('Dec 2, 2026');
    expect(formatDay(new Date(at), { timeZone: 'UTC' })).toBe('Dec 3, 2026');
    expect(formatTime(at, { timeZone: 'America/New_York' })).toBe('9:30 PM');
    expect(formatMoment(at, { timeZone: 'America/New_York' })).toBe('Dec 2, 2026, 9:30 PM');
  });

  it('never writes the machine form', () => {
    for (const text of [formatDay('2027-12-02'), formatMoment('2027-12-02T10:00:00Z', { timeZone: 'UTC' })]) {
      expect(text).not.toMatch(/\d{4}-\d{2}-\d{2}/);
    }
  });

  it('says a dash for a missing or unreadable date', () => {
    expect(formatDay(null)).toBe('—');
    expect(formatDay('not a date')).toBe('—');
    expect(formatMoment(undefined, { missing: 'Never' })).toBe('Never');
  });

  it('gives today as YYYY-MM-DD in the zone given', () => {
    const now = new Date('2026-12-03T02:30:00Z');
    expect(todayIso('America/New_York', now)).toBe('2026-12-02');
    expect(todayIso('UTC', now)).toBe('2026-12-03');
  });
});
