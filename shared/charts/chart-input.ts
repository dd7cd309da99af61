import type { EntranceReport, ProposedProfile, RuleProfile } from '../engine';
import type { ChartPoint } from './chart-geometry';
import type { ProfileChartInput } from './profile-chart';

export interface ChartSource {
  roadEdgeStationFt?: number;
  design?: { applied?: boolean };
}

export interface ChartResults {
  report: EntranceReport;
  proposal?: ProposedProfile;
  surveyed?: EntranceReport;
}

/**
 * A finding names the worst station of its rule; the chart marks every segment over its limit, so a landing that
 * is too steep along its whole length shows as such.
 */
function failingStations(report: EntranceReport, profile: RuleProfile, roadEdgeFt: number): number[] {
  const landingEnd = roadEdgeFt + profile.landing.lengthFt;
  const over = report.profile.segments
    .filter((s) => {
      if (s.toStationFt <= roadEdgeFt) return false;
      if (s.fromStationFt < landingEnd)
        return (
          s.gradePercent > profile.landing.maxGradePercent + 1e-9 ||
          s.gradePercent < profile.landing.minGradePercent - 1e-9
        );
      return Math.abs(s.gradePercent) > profile.maxGradePercent + 1e-9;
    })
    .map((s) => s.fromStationFt);
  const named = report.findings
    .filter((f) => f.status === 'fail' && f.stationFt !== undefined)
    .map((f) => f.stationFt as number);
  return [...new Set([...named, ...over])];
}

/**
 * The chart for a check, live or saved: when a proposal was applied the ground is the survey and the design is the
 * checked profile; otherwise the checked profile is the ground and a feasible proposal is drawn over it to compare.
 */
export function chartInputFor(inputs: ChartSource, results: ChartResults, profile: RuleProfile): ProfileChartInput {
  const { report, proposal, surveyed } = results;
  const applied = Boolean(inputs.design?.applied && surveyed);
  const ground = applied && surveyed ? surveyed.profile.points : report.profile.points;
  const design = applied ? report.profile.points : proposal?.feasible ? proposal.profile : undefined;
  const scrape = report.scrape;
  const scrapePoints =
    scrape.positionsChecked > 0 && scrape.minClearanceIn < profile.designVehicle.clearanceIn
      ? [
          {
            stationFt: scrape.atStationFt,
            label: scrape.passes ? `${scrape.minClearanceIn.toFixed(1)} in clear` : 'Scrapes',
          },
        ]
      : [];
  return {
    ground,
    design,
    checked: applied ? 'design' : 'ground',
    roadEdgeStationFt: inputs.roadEdgeStationFt ?? report.profile.points[0].stationFt,
    landing: profile.landing,
    maxGradePercent: profile.maxGradePercent,
    failingStationsFt: failingStations(report, profile, inputs.roadEdgeStationFt ?? report.profile.points[0].stationFt),
    scrapePoints,
  };
}

/**
 * The field sheet's chart, drawn by the same function: what the crew builds (the checked profile) over the ground
 * as surveyed. A proposal the office did not apply is not drawn, since nobody builds it.
 */
export function buildChartInputFor(
  inputs: ChartSource,
  results: ChartResults,
  profile: RuleProfile,
  groundAsSurveyed: readonly ChartPoint[] | null,
): ProfileChartInput {
  const chart = chartInputFor(inputs, results, profile);
  const built = results.report.profile.points;
  if (!groundAsSurveyed) return { ...chart, ground: built, design: undefined, checked: 'ground' };
  return { ...chart, ground: groundAsSurveyed, design: built, checked: 'design' };
}
