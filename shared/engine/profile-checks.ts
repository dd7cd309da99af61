import { atLeast, atMost, advisory, type Finding, notChecked } from './findings';
import { formatStation } from './station';
import { gradeBreaks, type ProfilePoint, type ProfileSegment, segmentGrades } from './profile';
import type { RuleProfile } from './rule-profile';
import { scrapeCheckPoints, type ScrapeResult } from './scrape';

export interface ProfileCheck {
  segments: ProfileSegment[];
  findings: Finding[];
  scrape: ScrapeResult;
}

interface Extreme {
  value: number;
  stationFt: number;
}

function extreme(segments: readonly ProfileSegment[], pick: (s: ProfileSegment) => number, larger: boolean): Extreme | null {
  let best: Extreme | null = null;
  for (const s of segments) {
    const value = pick(s);
    if (best === null || (larger ? value > best.value : value < best.value)) best = { value, stationFt: s.fromStationFt };
  }
  return best;
}

/** Landing, grade, grade-break and scrape findings for a normalised profile. */
export function checkProfileRules(
  points: readonly ProfilePoint[],
  rules: RuleProfile,
  roadEdgeStationFt: number,
  stepFt: number,
): ProfileCheck {
  const segments = segmentGrades(points);
  const findings: Finding[] = [];
  const landingEnd = roadEdgeStationFt + rules.landing.lengthFt;
  const entrance = segments.filter((s) => s.toStationFt > roadEdgeStationFt);
  // A segment that starts inside the landing carries its one grade over the landing part, so it is held to
  // the landing limits as a whole.
  const landing = entrance.filter((s) => s.fromStationFt < landingEnd);
  const beyond = entrance.filter((s) => s.fromStationFt >= landingEnd);
  const last = points[points.length - 1].stationFt;

  const landingBase = { unit: '%' };
  if (landing.length === 0 || rules.landing.lengthFt === 0) {
    findings.push(notChecked({ ...landingBase, ruleId: 'landing.max-grade', label: 'Landing grade (rising)' }, 'no landing in this profile'));
    findings.push(notChecked({ ...landingBase, ruleId: 'landing.min-grade', label: 'Landing grade (falling)' }, 'no landing in this profile'));
  } else {
    const hi = extreme(landing, (s) => s.gradePercent, true)!;
    const lo = extreme(landing, (s) => s.gradePercent, false)!;
    findings.push(atMost({ ...landingBase, ruleId: 'landing.max-grade', label: 'Landing grade (rising)', stationFt: hi.stationFt }, hi.value, rules.landing.maxGradePercent));
    findings.push(atLeast({ ...landingBase, ruleId: 'landing.min-grade', label: 'Landing grade (falling)', stationFt: lo.stationFt }, lo.value, rules.landing.minGradePercent));
  }
  if (last < landingEnd) {
    findings.push(advisory({ ruleId: 'landing.length', label: 'Landing length surveyed', unit: 'ft', stationFt: last }, last - roadEdgeStationFt, rules.landing.lengthFt, `the survey ends at ${formatStation(last)}, inside the ${rules.landing.lengthFt} ft landing`));
  }

  const steepest = extreme(beyond, (s) => Math.abs(s.gradePercent), true);
  const maxBase = { ruleId: 'grade.max', label: 'Driveway grade beyond the landing', unit: '%' };
  findings.push(steepest ? atMost({ ...maxBase, stationFt: steepest.stationFt }, steepest.value, rules.maxGradePercent) : notChecked(maxBase, 'the profile ends within the landing'));

  const drainBase = { ruleId: 'grade.min-drainage', label: 'Minimum grade for drainage', unit: '%' };
  if (rules.minDrainageGradePercent === undefined) findings.push(notChecked(drainBase, 'this rule profile sets no minimum grade'));
  else {
    const flattest = extreme(beyond, (s) => Math.abs(s.gradePercent), false);
    findings.push(flattest ? atLeast({ ...drainBase, stationFt: flattest.stationFt }, flattest.value, rules.minDrainageGradePercent) : notChecked(drainBase, 'the profile ends within the landing'));
  }

  const breaks = gradeBreaks(entrance);
  const breakBase = { ruleId: 'grade.max-change', label: 'Grade change at a break', unit: '%' };
  let sharpest: { value: number; stationFt: number } | null = null;
  for (const b of breaks) if (!sharpest || Math.abs(b.changePercent) > sharpest.value) sharpest = { value: Math.abs(b.changePercent), stationFt: b.stationFt };
  findings.push(sharpest ? atMost({ ...breakBase, stationFt: sharpest.stationFt }, sharpest.value, rules.maxGradeChangePercent) : notChecked(breakBase, 'the profile has no grade break'));

  const scrape = scrapeCheckPoints(points, rules.designVehicle, stepFt);
  const scrapeBase = { ruleId: 'scrape.clearance', label: `Clearance under a ${rules.designVehicle.name.toLowerCase()}`, unit: 'in' };
  findings.push(
    scrape.positionsChecked === 0
      ? notChecked(scrapeBase, 'the profile is shorter than the wheelbase')
      : atLeast({ ...scrapeBase, stationFt: scrape.atStationFt, note: `${scrape.where.replace('-', ' ')}, driving ${scrape.direction.replace(/-/g, ' ')}` }, scrape.minClearanceIn, 0),
  );
  return { segments, findings, scrape };
}
