/**
 * Money is integer cents everywhere. The two rates (sales tax, deposit share) are basis points: 1 bp = 1/100 of a
 * percent, so 6.25% is 625. Quantities carry at most two decimals and are counted in hundredths for the arithmetic.
 *
 * Rounding rule, the one place it is stated: every product is rounded half up to the whole cent (amounts are never
 * negative, so half up is also half away from zero). A line's amount is rounded on its own, tax is rounded once on the
 * taxable subtotal, and the deposit is rounded once on the total. All of it is integer arithmetic (BigInt where a
 * product could pass 2^53), so no binary fraction ever touches a sum of money.
 */

/** Rounds numerator / denominator half up; both are non-negative integers. */
function divideHalfUp(numerator: bigint, denominator: bigint): bigint {
  return (numerator * 2n + denominator) / (denominator * 2n);
}

const toSafeNumber = (value: bigint): number => {
  if (value > BigInt(Number.MAX_SAFE_INTEGER)) throw new RangeError('amount is too large to count in cents');
  return Number(value);
};

/** Hundredths of a unit from a quantity with at most two decimals (12.5 -> 1250). */
export function quantityHundredths(quantity: number): number {
  return Math.round(quantity * 100);
}

/** True when a number has at most two decimals (within the float's own noise). */
export function hasAtMostTwoDecimals(value: number): boolean {
  return Math.abs(value * 100 - Math.round(value * 100)) < 1e-6;
}

/** quantity x unit price, half up to the cent. */
export function lineAmountCents(quantity: number, unitPriceCents: number): number {
  return toSafeNumber(divideHalfUp(BigInt(quantityHundredths(quantity)) * BigInt(unitPriceCents), 100n));
}

/** amount x basis points / 10,000, half up to the cent. */
export function shareOfCents(amountCents: number, basisPoints: number): number {
  return toSafeNumber(divideHalfUp(BigInt(amountCents) * BigInt(basisPoints), 10_000n));
}

export interface PricedLine {
  quantity: number;
  unitPriceCents: number;
  taxable: boolean;
}

export interface QuoteTotals {
  subtotalCents: number;
  taxableCents: number;
  taxCents: number;
  totalCents: number;
  depositCents: number;
}

export function quoteTotals(lines: readonly PricedLine[], taxRateBp: number, depositRateBp: number): QuoteTotals {
  let subtotal = 0;
  let taxable = 0;
  for (const line of lines) {
    const amount = lineAmountCents(line.quantity, line.unitPriceCents);
    subtotal += amount;
    if (line.taxable) taxable += amount;
  }
  const taxCents = shareOfCents(taxable, taxRateBp);
  const totalCents = subtotal + taxCents;
  return {
    subtotalCents: subtotal,
    taxableCents: taxable,
    taxCents,
    totalCents,
    depositCents: shareOfCents(totalCents, depositRateBp),
  };
}

/** "$1,234.56" from cents, without a float: the digits are split as text. */
export function formatCents(cents: number): string {
  const negative = cents < 0;
  const digits = String(Math.abs(Math.trunc(cents))).padStart(3, '0');
  const dollars = digits.slice(0, -2).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return `${negative ? '-' : ''}$${dollars}.${digits.slice(-2)}`;
}

/** "6.25%" from basis points. */
export function formatBasisPoints(bp: number): string {
  const whole = Math.trunc(bp / 100);
  const rest = bp % 100;
  return rest === 0 ? `${whole}%` : `${whole}.${String(rest).padStart(2, '0').replace(/0$/, '')}%`;
}

/**
 * Cents from what a person typed as dollars ("1,234.5", "$12", "0.07"), or null when it is not an amount of money
 * with at most two decimals. Parsed as text, never through a float.
 */
export function parseDollarsToCents(text: string): number | null {
  const cleaned = text.trim().replace(/^\$/, '').replace(/,/g, '');
  const match = /^(\d{1,9})(?:\.(\d{0,2}))?$/.exec(cleaned) ?? /^()\.(\d{1,2})$/.exec(cleaned);
  if (!match) return null;
  const dollars = match[1] === '' ? 0 : Number(match[1]);
  const cents = Number((match[2] ?? '').padEnd(2, '0'));
  return dollars * 100 + cents;
}

/** "12.34" from cents, for an input box. */
export function centsToDollarsText(cents: number): string {
  return formatCents(cents).replace(/^\$/, '').replace(/,/g, '');
}

/** Basis points from a typed percent ("6.25", "6.25%"), or null when not a percent with at most two decimals. */
export function parsePercentToBasisPoints(text: string): number | null {
  const match = /^(\d{1,3})(?:\.(\d{0,2}))?$/.exec(text.trim().replace(/%$/, '').trim());
  if (!match) return null;
  return Number(match[1]) * 100 + Number((match[2] ?? '').padEnd(2, '0'));
}
