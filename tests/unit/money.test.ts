import { describe, expect, it } from 'vitest';
import {
  formatBasisPoints,
  formatCents,
  lineAmountCents,
  parseDollarsToCents,
  parsePercentToBasisPoints,
  quoteTotals,
  shareOfCents,
} from '@shared/money/money';

describe('money in integer cents', () => {
  it('rounds a line half up to the cent', () => {
    expect(lineAmountCents(0.5, 1)).toBe(1); // half a cent
    expect(lineAmountCents(0.49, 1)).toBe(0);
    expect(lineAmountCents(1.25, 1001)).toBe(1251); // 1251.25
    expect(lineAmountCents(0.1, 3)).toBe(0); // 0.3 of a cent
    // 0.1 + 0.2 style binary fractions never reach the sum: 0.07 x $100.00 is exactly $7.00.
    expect(lineAmountCents(0.07, 10_000)).toBe(700);
    expect(lineAmountCents(100_000, 10_000_000)).toBe(1_000_000_000_000);
  });

  it('takes a share in basis points half up', () => {
    expect(shareOfCents(1252, 3000)).toBe(376); // 375.6
    expect(shareOfCents(5, 1000)).toBe(1); // 0.5
    expect(shareOfCents(4, 1000)).toBe(0); // 0.4
    expect(shareOfCents(100_00, 625)).toBe(625);
  });

  it('taxes only the taxed lines and takes the deposit from the total', () => {
    const totals = quoteTotals(
      [
        { quantity: 10, unitPriceCents: 1000, taxable: true },
        { quantity: 1, unitPriceCents: 5000, taxable: false },
      ],
      625,
      3000,
    );
    expect(totals).toEqual({
      subtotalCents: 15000,
      taxableCents: 10000,
      taxCents: 625,
      totalCents: 15625,
      depositCents: 4688, // 4687.5 rounds up
    });
  });

  it('reads typed dollars as text, refusing a fraction of a cent', () => {
    expect(parseDollarsToCents('$1,234.5')).toBe(123450);
    expect(parseDollarsToCents('0.07')).toBe(7);
    expect(parseDollarsToCents('.5')).toBe(50);
    expect(parseDollarsToCents('12')).toBe(1200);
    expect(parseDollarsToCents('12.345')).toBeNull();
    expect(parseDollarsToCents('-5')).toBeNull();
    expect(parseDollarsToCents('')).toBeNull();
    expect(parsePercentToBasisPoints('6.25%')).toBe(625);
    expect(parsePercentToBasisPoints('6.255')).toBeNull();
  });

  it('writes cents and rates for people', () => {
    expect(formatCents(123456)).toBe('$1,234.56');
    expect(formatCents(5)).toBe('$0.05');
    expect(formatCents(0)).toBe('$0.00');
    expect(formatBasisPoints(625)).toBe('6.25%');
    expect(formatBasisPoints(3000)).toBe('30%');
    expect(formatBasisPoints(650)).toBe('6.5%');
  });
});
