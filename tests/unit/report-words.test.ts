import { describe, expect, it } from 'vitest';
import { commonRuralTemplate } from '@shared/engine';
import { profileValueRows, withArticle } from '../../server/services/reports/report-words';

describe("the report's words", () => {
  it('puts the right article before a size read aloud', () => {
    expect(withArticle('18 in')).toBe('an 18 in');
    expect(withArticle('8 in')).toBe('an 8 in');
    expect(withArticle('11 in')).toBe('an 11 in');
    expect(withArticle('80 in')).toBe('an 80 in');
    expect(withArticle('24 in')).toBe('a 24 in');
    expect(withArticle('15 in')).toBe('a 15 in');
    expect(withArticle('118 in')).toBe('a 118 in');
  });

  it("names each rule profile value by the form's label and writes choices in words", () => {
    const rows = profileValueRows(commonRuralTemplate);
    const byLabel = new Map(rows.map(([label, value]) => [label, value]));
    expect(byLabel.get('Sight distance required')).toBe('Intersection sight distance');
    expect(byLabel.get('Vehicle pulling out')).toBe('Passenger car');
    expect(byLabel.get('Elevation tolerance')).toBe('0 ft');
    expect(byLabel.get('Maximum driveway grade beyond the landing')).toBe('17%');
    for (const [label, value] of rows) {
      expect(label).not.toMatch(/\./);
      expect(value).not.toMatch(/^(us|metric|intersection|stopping|passenger)$/);
    }
  });
});
