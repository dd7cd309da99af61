import { atLeast, atMost, advisory, type Finding, notChecked } from './findings';
import { gradeBreaks, type ProfilePoint, type ProfileSegment, segmentGrades } from './profile';
import type { RuleProfile } from './rule-profile';
import { roundTo, snap } from './numbers';
import { pondingFinding } from './ponding';
import { scrapeCheckPoints, type ScrapeResult } from './scrape';
import { formatStation } from './station';
import { stationAfter, stationAtOrAfter, stationBefore } from './station-tolerance';

export interface ProfileCheck {
  segments: ProfileSegment[];
  findings: Finding[];
  scrape: ScrapeResult;
}

interface Extreme {
  value: number;
  stationFt: number;
}

function extreme<T>(
  items: readonly T[],
  value: (t: T) => number,
  station: (t: T) => number,
  larger: boolean,
): Extreme | null {
  let best: Extreme | null = null;
  for (const item of items) {
    const v = value(item);
    if (best === null || (larger ? v > best.value : v < best.value)) best = { value: v, stationFt: station(item) };
  }
  return best;
}

const fromStation = (s: ProfileSegment) => s.fromStationFt;
const grade = (s: ProfileSegment) => s.gradePercent;
const steepness = (s: ProfileSegment) => Math.abs(s.gradePercent);

const RULE = {
  landingMax: { ruleId: 'landing.max-grade', label: 'Landing grade (rising)', unit: '%' },
  landingMin: { ruleId: 'landing.min-grade', label: 'Landing grade (falling)', unit: '%' },
  landingLength: { ruleId: 'landing.length', label: 'Landing length surveyed', unit: 'ft' },
  max: { ruleId: 'grade.max', label: 'Driveway grade beyond the landing', unit: '%' },
  drainage: { ruleId: 'grade.min-drainage', label: 'Minimum grade for drainage', unit: '%' },
  change: { ruleId: 'grade.max-change', label: 'Grade change at a break', unit: '%' },
};

function landingFindings(landing: ProfileSegment[], rules: RuleProfile, surveyedFt: number): Finding[] {
  if (landing.length === 0 || rules.landing.lengthFt === 0) {
    return [
      notChecked(RULE.landingMax, 'no landing in this profile'),
      notChecked(RULE.landingMin, 'no landing in this profile'),
    ];
  }
  const hi = extreme(landing, grade, fromStation, true)!;
  const lo = extreme(landing, grade, fromStation, false)!;
  const findings = [
    atMost({ ...RULE.landingMax, stationFt: hi.stationFt }, hi.value, rules.landing.maxGradePercent),
    atLeast({ ...RULE.landingMin, stationFt: lo.stationFt }, lo.value, rules.landing.minGradePercent),
  ];
  if (stationBefore(surveyedFt, rules.landing.lengthFt)) {
    const why = `the survey stops ${surveyedFt} ft in, inside the ${rules.landing.lengthFt} ft landing`;
    findings.push(advisory(RULE.landingLength, surveyedFt, rules.landing.lengthFt, why));
  }
  return findings;
}

function gradeFindings(entrance: ProfileSegment[], beyond: ProfileSegment[], rules: RuleProfile): Finding[] {
  const findings: Finding[] = [];
  const steepest = extreme(beyond, steepness, fromStation, true);
  findings.push(
    steepest
      ? atMost({ ...RULE.max, stationFt: steepest.stationFt }, steepest.value, rules.maxGradePercent)
      : notChecked(RULE.max, 'the profile ends within the landing'),
  );
  const flattest = extreme(beyond, steepness, fromStation, false);
  if (rules.minDrainageGradePercent === undefined)
    findings.push(notChecked(RULE.drainage, 'this rule profile sets no minimum grade'));
  else if (!flattest) findings.push(notChecked(RULE.drainage, 'the profile ends within the landing'));
  else
    findings.push(
      atLeast({ ...RULE.drainage, stationFt: flattest.stationFt }, flattest.value, rules.minDrainageGradePercent),
    );

  const sharpest = extreme(
    gradeBreaks(entrance),
    (b) => Math.abs(b.changePercent),
    (b) => b.stationFt,
    true,
  );
  findings.push(
    sharpest
      ? atMost({ ...RULE.change, stationFt: sharpest.stationFt }, sharpest.value, rules.maxGradeChangePercent)
      : notChecked(RULE.change, 'the profile has no grade break'),
  );
  return findings;
}

function scrapeFindings(scrape: ScrapeResult, rules: RuleProfile): Finding[] {
  const vehicle = rules.designVehicle.name.toLowerCase();
  const base = { ruleId: 'scrape.clearance', label: `Clearance under a ${vehicle}`, unit: 'in' };
  if (scrape.positionsChecked === 0) return [notChecked(base, 'the profile is shorter than the wheelbase')];
  const note = `${scrape.where.replace('-', ' ')}, driving ${scrape.direction.replace(/-/g, ' ')}`;
  const findings = [atLeast({ ...base, stationFt: scrape.atStationFt, note }, scrape.minClearanceIn, 0)];
  const partial = scrape.partialCoverage;
  if (partial) {
    const why =
      `the survey ends ${roundTo(partial.surveyedPastFt, 2)} ft past the grade break at station ${formatStation(partial.breakStationFt)}; ` +
      `a ${vehicle} needs ${roundTo(partial.neededFt, 2)} ft to cross it fully, so the clearance there was checked only in part: survey further in`;
    const coverage = {
      ruleId: 'scrape.coverage',
      label: 'Scrape check past the last grade break',
      unit: 'ft',
      stationFt: partial.breakStationFt,
    };
    // The distance past the break is a minimum, so what is missing shows as negative room to spare.
    findings.push({
      ...advisory(coverage, partial.surveyedPastFt, partial.neededFt, why),
      limitKind: 'at-least',
      margin: snap(partial.surveyedPastFt - partial.neededFt),
    });
  }
  return findings;
}

/**
 * Landing, grade, grade-break, low-point and scrape findings for a normalised profile. `surveyed` is the ground as
 * shot, when `points` also carries the road side drawn from its stated slopes: the car drives over those, but water
 * on the road's own cross slope runs along the road and its ditch, so only surveyed shots can hold it.
 */
export function checkProfileRules(
  points: readonly ProfilePoint[],
  rules: RuleProfile,
  roadEdgeStationFt: number,
  stepFt: number,
  surveyed: readonly ProfilePoint[] = points,
): ProfileCheck {
  const segments = segmentGrades(points);
  const landingEnd = roadEdgeStationFt + rules.landing.lengthFt;
  const entrance = segments.filter((s) => stationAfter(s.toStationFt, roadEdgeStationFt));
  // A segment that starts inside the landing carries its one grade over the landing part, so it is held to
  // the landing limits as a whole. Stations are compared at the survey's precision, not in raw binary.
  const landing = entrance.filter((s) => stationBefore(s.fromStationFt, landingEnd));
  const beyond = entrance.filter((s) => stationAtOrAfter(s.fromStationFt, landingEnd));
  const surveyedFt = points[points.length - 1].stationFt - roadEdgeStationFt;
  const scrape = scrapeCheckPoints(points, rules.designVehicle, stepFt);
  const findings = [
    ...landingFindings(landing, rules, surveyedFt),
    ...gradeFindings(entrance, beyond, rules),
    pondingFinding(surveyed, roadEdgeStationFt, rules.minDrainageGradePercent),
    ...scrapeFindings(scrape, rules),
  ];
  return { segments, findings, scrape };
}
