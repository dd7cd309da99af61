import type { Finding, ProfileSegment, RuleProfile } from '@shared/engine';
import { formatStation } from '@shared/engine';
import type { GradeCheckInputs, GradeCheckResults } from '@shared/contracts/grade-checks';

const pct = (v: number) => `${Math.round(Math.abs(v) * 10) / 10}%`;
const yd = (v: number) => `${Math.round(v)} cu yd`;

function authorityName(profile: RuleProfile) {
  const name = profile.jurisdictionName ?? profile.name ?? 'the road authority';
  return `${name}'s rules (version ${profile.version ?? '?'})`;
}

function steepest(segments: readonly ProfileSegment[]) {
  return segments.reduce((m, s) => Math.max(m, Math.abs(s.gradePercent)), 0);
}

/** The design in a sentence: how the landing sits and how steep it gets beyond it. */
function designWords(segments: readonly ProfileSegment[], roadEdgeFt: number, landingFt: number) {
  const landing = segments.filter((s) => s.toStationFt > roadEdgeFt && s.fromStationFt < roadEdgeFt + landingFt);
  const beyond = segments.filter((s) => s.fromStationFt >= roadEdgeFt + landingFt);
  const parts = [
    `a landing no steeper than ${pct(steepest(landing))} for the first ${landingFt} ft from the road edge`,
  ];
  if (beyond.length > 0)
    parts.push(
      `then no more than ${pct(steepest(beyond))} up to the end of the survey at ${formatStation(beyond[beyond.length - 1].toStationFt)}`,
    );
  return parts.join(', ');
}

function failures(findings: readonly Finding[]) {
  return findings
    .filter((f) => f.status === 'fail')
    .map((f) => {
      const at = f.stationFt === undefined ? '' : ` at station ${formatStation(f.stationFt)}`;
      return `${f.label.toLowerCase()}${at}`;
    });
}

/**
 * What the homeowner reads on their request page and in the "checked" e-mail: whether the entrance meets the
 * road authority's rules and, when the ground as found does not, what we propose instead.
 */
export function plainSummary(inputs: GradeCheckInputs, results: GradeCheckResults, profile: RuleProfile): string {
  const rules = authorityName(profile);
  const { report, proposal, surveyed } = results;
  const roadEdge = inputs.roadEdgeStationFt ?? report.profile.points[0].stationFt;
  if (!report.passes) {
    return `The entrance as checked does not yet meet ${rules}: ${failures(report.findings).join('; ')}. We will be in touch about what it needs.`;
  }
  const design = designWords(report.profile.segments, roadEdge, profile.landing.lengthFt);
  if (inputs.design?.applied && surveyed && !surveyed.passes) {
    const earth = proposal?.feasible
      ? ` It moves about ${yd(proposal.cutCuYd)} of cut and ${yd(proposal.fillCuYd)} of fill.`
      : '';
    const nearRoad = surveyed.findings.some((f) => f.status === 'fail' && f.ruleId.startsWith('landing.'));
    const need = nearRoad
      ? 'needs a gentler slope near the road'
      : `needs regrading (${failures(surveyed.findings).join('; ')})`;
    return `The ground as it is now ${need}: here is what we propose. ${design[0].toUpperCase()}${design.slice(1)}.${earth} The proposed entrance meets ${rules}.`;
  }
  return `Your entrance meets ${rules}: ${design}.`;
}
