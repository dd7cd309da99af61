import type { Finding } from './findings';
import { formatStation } from './station';

export interface CheckSummary {
  pass: number;
  fail: number;
  advisory: number;
  notChecked: number;
  text: string;
}

const number = (v: number, unit: string) => `${Math.round(v * 100) / 100}${unit === '%' ? '%' : ` ${unit}`}`;

function failureWords(f: Finding): string {
  const where = f.stationFt === undefined ? '' : ` at station ${formatStation(f.stationFt)}`;
  if (f.measured === null || f.limit === null) return `${f.label.toLowerCase()}${where}`;
  if (f.ruleId === 'scrape.clearance') {
    return `a car would scrape${where} (it is ${number(-f.measured, f.unit)} short of clearing)`;
  }
  if (f.ruleId === 'drainage.low-point') return `water would stand${where} (${number(f.measured, f.unit)} deep)`;
  const bound =
    f.limitKind === 'at-least'
      ? `at least ${number(f.limit, f.unit)} is needed`
      : `at most ${number(f.limit, f.unit)} is allowed`;
  return `${f.label.toLowerCase()} is ${number(f.measured, f.unit)}${where} where ${bound}`;
}

/** A sentence a homeowner can read, plus the counts a screen needs. */
export function summarise(findings: readonly Finding[], profileName: string): CheckSummary {
  const count = (s: Finding['status']) => findings.filter((f) => f.status === s).length;
  const pass = count('pass');
  const fail = count('fail');
  const adv = count('advisory');
  const notChecked = count('not-checked');
  const checked = pass + fail + adv;
  const parts: string[] = [];
  if (checked === 0) parts.push(`Nothing could be checked against ${profileName} with the measurements given.`);
  else if (fail === 0) parts.push(`This entrance meets all ${checked} rules of ${profileName} that could be checked.`);
  else {
    const failed = findings.filter((f) => f.status === 'fail');
    parts.push(
      `This entrance does not yet meet ${fail} of the ${checked} rules of ${profileName} that were checked: ${failed.map(failureWords).join('; ')}.`,
    );
  }
  if (adv > 0) parts.push(`${adv} ${adv === 1 ? 'item needs' : 'items need'} a closer look.`);
  if (notChecked > 0)
    parts.push(
      `${notChecked} ${notChecked === 1 ? 'rule was' : 'rules were'} not checked because the measurements or limits were not given.`,
    );
  return { pass, fail, advisory: adv, notChecked, text: parts.join(' ') };
}
