import type { Highs } from 'highs';
import { clearanceBreaks, crestStation, drainsEverywhere, earthMoved, tighten } from './design-measures';
import { DesignProgram } from './design-program';
import { solveLinear, type SolveOutcome } from './design-solver';
import { transitionStations, withStations } from './design-stations';
import { designVertices, type FineStretch } from './design-vertices';
import { crestAllowed, explainInfeasible } from './infeasible-reason';
import {
  buildLeastEarthModel,
  type DesignModel,
  type Directions,
  GRADE_MARGIN,
  segmentRanges,
  type SegmentRanges,
} from './least-earth-model';
import type { Finding } from './findings';
import type { ProfileCheck } from './profile-checks';
import { elevationAt, type ProfilePoint } from './profile';
import { checkDesign, roadEdgeReason, withRoadEdge } from './design-road-side';
import { roadSidePoints, type RoadSide } from './road-edge';
import type { DesignVehicle, RuleProfile } from './rule-profile';
import { STATION_TOLERANCE_FT } from './station-tolerance';

export interface DesignFound {
  /** The stations designed: the survey's, plus the landing's end and any transition stations. */
  ground: ProfilePoint[];
  design?: ProfilePoint[];
  reason?: string;
}

interface Job {
  highs: Highs;
  rules: RuleProfile;
  roadEdgeFt: number;
  targetEndFt: number | undefined;
  scrapeStepFt: number;
  margin: number;
  /** The road side, when given: the break at the road edge and the scrape over it are held like any other. */
  road?: RoadSide;
  /** The road side's fixed points in front of the road edge. */
  before?: ProfilePoint[];
  /** Hand back the first solution without the exact check (see searchDesign). */
  unchecked?: boolean;
}

const MAX_TIGHTENING = 8;
// The first attempts tighten only where the exact check scraped; after these, everywhere, so the loop ends.
const LOCAL_ATTEMPTS = 3;
// Transition stations may double a long survey's stations at most.
const MAX_DESIGN_STATIONS = 4_000;

const scrapeReason = (v: DesignVehicle) =>
  `no profile keeps a ${v.name.toLowerCase()} from scraping while meeting the other limits`;

function bendReason(rules: RuleProfile): string {
  const drain =
    rules.minDrainageGradePercent === undefined
      ? ''
      : ` while keeping the ${rules.minDrainageGradePercent}% drainage grade`;
  return `the ${rules.maxGradeChangePercent}% grade-change limit cannot bend the profile enough to reach the end elevation${drain} without a low point that holds water`;
}

type Attempt =
  | { status: 'infeasible'; detail: string }
  | { status: 'failed'; detail: string }
  | { status: 'solved'; design: ProfilePoint[]; rising: Float64Array; verdict: () => Verdict };

/** The exact check of a solved design, made only when asked for: most relaxations and crests tried are never kept. */
interface Verdict {
  check: ProfileCheck;
  failing: Finding[];
}

/** The stations designed, and the indices of those where the design may break. */
interface Layout {
  ground: ProfilePoint[];
  vertices: number[];
  /** Where an earlier design on these stations turned from rising to falling: the crest to try first. */
  crestFt?: number;
  /** The linear programme on these stations, loaded once for every crest and share tried. */
  program?: DesignProgram;
  /** An earlier design near the answer (on other stations): the solver starts from it. */
  near?: readonly ProfilePoint[];
}

/** Segments rising before the crest at `crestFt`. */
const risingBefore = (corners: readonly ProfilePoint[], crestFt: number) =>
  corners.slice(1).filter((c) => c.stationFt <= crestFt + STATION_TOLERANCE_FT).length;

function solveOnce(
  job: Job,
  layout: Layout,
  ranges: SegmentRanges[],
  share: Float64Array | undefined,
  directions: Directions,
): Attempt {
  const { ground, vertices, program } = layout;
  let built: DesignModel;
  let out: SolveOutcome;
  if (program && directions !== 'choose') {
    built = program.built;
    out = program.solve(share, directions);
  } else {
    const budget = share ? { vehicle: job.rules.designVehicle, share, before: job.before } : undefined;
    built = buildLeastEarthModel(
      ground,
      vertices,
      ranges,
      job.rules,
      job.roadEdgeFt,
      job.targetEndFt,
      budget,
      directions,
      job.margin,
    );
    out = solveLinear(job.highs, built.model);
  }
  if (out.status === 'infeasible' || out.status === 'failed') return out;
  const design = built.read(out.x);
  let verdict: Verdict | undefined;
  const judge = () => {
    const check = checkDesign(design, job.rules, job.road, job.scrapeStepFt);
    return { check, failing: check.findings.filter((f) => f.status === 'fail') };
  };
  return { status: 'solved', design, rising: built.rising(out.x), verdict: () => (verdict ??= judge()) };
}

const risingCount = (rising: Float64Array, above: number) => {
  let k = 0;
  while (k < rising.length && rising[k] > above) k++;
  return k;
};

// How far outside a direction's grade range a solved grade may sit and still count as in it (the solver's own
// tolerance over the shortest segment); the exact check afterwards judges the limits themselves.
const DIRECTION_SLACK = 1e-7;

// A crest whose design moves no more earth than the relaxation's lower bound plus this depth over the whole
// length is taken without trying the others: half the hundredth of a foot a survey is read to, so no survey
// could tell the designs apart.
const EARTH_TOLERANCE_FT = 0.005;

/**
 * The crest position (segments rising before it) that the design's own grades fit, nearest `near`: every
 * segment before it within its rising range and every one after within its falling range; none if no position fits.
 */
function crestOf(
  design: readonly ProfilePoint[],
  vertices: readonly number[],
  ranges: readonly SegmentRanges[],
  near: number,
): number | undefined {
  const m = ranges.length;
  const within = (g: number, r: { lo: number; hi: number } | null) =>
    r !== null && g >= r.lo - DIRECTION_SLACK && g <= r.hi + DIRECTION_SLACK;
  const grade = (j: number) => {
    const [a, b] = [design[vertices[j]], design[vertices[j + 1]]];
    return (b.elevationFt - a.elevationFt) / (b.stationFt - a.stationFt);
  };
  let rises = 0;
  while (rises < m && within(grade(rises), ranges[rises].rise)) rises++;
  let fallsFrom = m;
  while (fallsFrom > 0 && within(grade(fallsFrom - 1), ranges[fallsFrom - 1].fall)) fallsFrom--;
  return fallsFrom <= rises ? Math.min(rises, Math.max(fallsFrom, near)) : undefined;
}

/**
 * Where the design turns from rising to falling. The linear relaxation is solved first: its cost bounds every
 * design from below, and its directions rounded at a few thresholds give crest positions to try as plain linear
 * programmes. Only when none of them is feasible does the mixed-integer search (bounded by a node limit) decide,
 * so "impossible" is said only when the relaxation or the full search proves it.
 */
function chooseCrest(
  job: Job,
  layout: Layout,
  ranges: SegmentRanges[],
  share: Float64Array | undefined,
  allowed: (k: number) => boolean,
): { out: Attempt; k?: number } {
  const { ground } = layout;
  const relaxed = solveOnce(job, layout, ranges, share, 'relaxed');
  if (relaxed.status !== 'solved') return { out: relaxed };
  // Whole directions, or grades that already rise and then fall within their limits: the relaxation's answer
  // is itself a design, and its cost is a lower bound, so it is the best design.
  const whole = risingCount(relaxed.rising, 0.5);
  if (relaxed.rising.every((r) => r < 1e-7 || r > 1 - 1e-7)) return { out: relaxed, k: whole };
  const consistent = crestOf(relaxed.design, layout.vertices, ranges, whole);
  if (consistent !== undefined) return { out: relaxed, k: consistent };
  const ks = [...new Set([0.5, 1 - 1e-6, 1e-6].map((t) => risingCount(relaxed.rising, t)))].filter(allowed);
  let best: { out: Attempt & { status: 'solved' }; k: number; earth: number } | undefined;
  const bound = earthMoved(ground, relaxed.design);
  const length = ground[ground.length - 1].stationFt - ground[0].stationFt;
  for (const k of ks) {
    const out = solveOnce(job, layout, ranges, share, k);
    if (out.status !== 'solved') continue;
    const earth = earthMoved(ground, out.design);
    if (!best || earth < best.earth) best = { out, k, earth };
    if (earth <= bound + EARTH_TOLERANCE_FT * length) break;
  }
  if (best) return best;
  const mip = solveOnce(job, layout, ranges, share, 'choose');
  return mip.status === 'solved' ? { out: mip, k: risingCount(mip.rising, 0.5) } : { out: mip };
}

/** Clearance in the model, then the exact scrape check; where it still scrapes, that neighbourhood is tightened. */
function designOn(job: Job, bare: Layout): DesignFound {
  const { ground } = bare;
  const corners = bare.vertices.map((i) => ground[i]);
  const ranges = withRoadEdge(segmentRanges(corners, job.rules), job.road, job.rules);
  if (job.road && ranges.length > 0 && !ranges[0].rise && !ranges[0].fall)
    return { ground, reason: roadEdgeReason(job.rules, job.road) };
  const reason = explainInfeasible(corners, ranges, job.rules, job.roadEdgeFt, job.targetEndFt);
  if (reason) return { ground, reason };
  const { rules, roadEdgeFt, targetEndFt, margin, before } = job;
  const near =
    bare.near && bare.crestFt !== undefined
      ? {
          at: Float64Array.from(corners, (c) => elevationAt(bare.near!, c.stationFt)),
          k: risingBefore(corners, bare.crestFt),
        }
      : undefined;
  const program = new DesignProgram(job.highs, {
    ground,
    vertices: bare.vertices,
    ranges,
    rules,
    roadEdgeFt,
    targetEndFt,
    margin,
    before,
    near,
  });
  try {
    return designWith(job, { ...bare, program }, corners, ranges);
  } finally {
    program.dispose();
  }
}

function designWith(job: Job, layout: Layout, corners: ProfilePoint[], ranges: SegmentRanges[]): DesignFound {
  const { ground } = layout;
  const allowed = crestAllowed(corners, ranges, job.roadEdgeFt, job.targetEndFt);
  const share = new Float64Array(corners.length).fill(1);
  // A known crest is tried as it is; only if it cannot be met is the relaxation solved to choose again.
  let k = layout.crestFt === undefined ? undefined : risingBefore(corners, layout.crestFt);
  for (let attempt = 0; attempt < MAX_TIGHTENING; attempt++) {
    let out = k === undefined ? undefined : solveOnce(job, layout, ranges, share, k);
    if (!out || out.status === 'infeasible') {
      const pick = chooseCrest(job, layout, ranges, share, allowed);
      out = pick.out;
      k = pick.k;
    }
    if (out.status === 'failed')
      return {
        ground,
        reason: `no design was found within the solver's search limit (${out.detail}); the limits may still allow one`,
      };
    if (job.unchecked)
      return out.status === 'solved' ? { ground, design: out.design } : { ground, reason: 'not solved' };
    if (out.status === 'infeasible') {
      // The clearance limits are linear estimates; without them the programme says whether the rest can be met.
      const free = chooseCrest(job, layout, ranges, undefined, allowed).out;
      if (free.status === 'infeasible') return { ground, reason: bendReason(job.rules) };
      if (free.status === 'solved' && free.verdict().failing.length === 0) return { ground, design: free.design };
      return { ground, reason: scrapeReason(job.rules.designVehicle) };
    }
    const { check, failing } = out.verdict();
    if (failing.length === 0) return { ground, design: out.design };
    if (failing.some((f) => f.ruleId !== 'scrape.clearance')) {
      return {
        ground,
        reason: `the solver's profile still breaks ${failing.map((f) => f.label.toLowerCase()).join(', ')}`,
      };
    }
    tighten(share, corners, check.scrape.atStationFt, job.rules.designVehicle, attempt < LOCAL_ATTEMPTS);
  }
  return { ground, reason: scrapeReason(job.rules.designVehicle) };
}

const passes = (design: readonly ProfilePoint[], job: Job) =>
  checkDesign(design, job.rules, job.road, job.scrapeStepFt).findings.every((f) => f.status !== 'fail');

/** Ground that already meets every limit from the given road edge to the given end is the least-earth design. */
function alreadyComplies(survey: readonly ProfilePoint[], job: Job): boolean {
  const last = survey[survey.length - 1].elevationFt;
  if (survey[0].elevationFt !== job.roadEdgeFt || (job.targetEndFt !== undefined && last !== job.targetEndFt))
    return false;
  if (!drainsEverywhere(survey)) return false;
  return passes(survey, job);
}

export function searchDesign(
  highs: Highs,
  survey: readonly ProfilePoint[],
  rules: RuleProfile,
  roadEdgeFt: number,
  targetEndFt: number | undefined,
  scrapeStepFt: number,
  road?: RoadSide,
): DesignFound {
  const before = road
    ? roadSidePoints({ stationFt: survey[0].stationFt, elevationFt: roadEdgeFt }, road, rules.designVehicle)
    : undefined;
  const job: Job = { highs, rules, roadEdgeFt, targetEndFt, scrapeStepFt, margin: GRADE_MARGIN, road, before };
  // Checked as surveyed: a landing station added to straight ground could make a rule apply that did not before.
  if (alreadyComplies(survey, job)) return { ground: [...survey], design: survey.map((p) => ({ ...p })) };
  // The design needs a station where the landing ends so it can break there rather than at the next shot.
  const landingEnd = survey[0].stationFt + rules.landing.lengthFt;
  const ground = withStations(survey, [landingEnd]);
  const surveyed = new Set(survey.map((p) => p.stationFt));
  // Added stations (the landing's end, a curve's) are always vertices; so is a shot within tolerance of the landing's end.
  const keep = new Set(
    ground.map((p) => p.stationFt).filter((s) => !surveyed.has(s) || Math.abs(s - landingEnd) < STATION_TOLERANCE_FT),
  );
  const coarse: Layout = { ground, vertices: designVertices(ground, keep) };
  const curves = (found: DesignFound, base: Layout) => curved(job, found, base, keep, surveyed);
  // The curves are placed from the first solution before its exact check. A curved design that moves less earth
  // than that solution also beats whatever the check and tightening would make of it (they only add earth), so
  // the coarse design is then never checked; if that solution passes the check as it is, it is the first design.
  const quick = designOn({ ...job, unchecked: true }, coarse);
  if (quick.design) {
    const second = curves(quick, coarse);
    if (second) return second;
    if (passes(quick.design, job)) return quick;
  }
  let first = designWithMargin(job, coarse);
  let base = coarse;
  // Fewer vertices restrict the design; before saying no design exists, every station is given a vertex.
  if (!first.design && coarse.vertices.length < ground.length) {
    base = { ground, vertices: ground.map((_, i) => i) };
    first = designWithMargin(job, base);
  }
  return (first.design && curves(first, base)) || first;
}

/**
 * A short vertical curve over stations a fraction of the wheelbase apart often clears with less earth than
 * holding one sharp break to the single-break limit: the design on stations added around the breaks that use
 * more than half of what one break may take, when it moves less earth than `first`.
 */
function curved(
  job: Job,
  first: DesignFound,
  base: Layout,
  keep: ReadonlySet<number>,
  surveyed: ReadonlySet<number>,
): DesignFound | undefined {
  const v = job.rules.designVehicle;
  const { ground } = base;
  const breaks = clearanceBreaks(first.design!, v);
  if (breaks.length === 0) return undefined;
  const radius = v.wheelbaseFt + Math.max(v.frontOverhangFt, v.rearOverhangFt);
  const step = v.wheelbaseFt / 8;
  const dense = withStations(
    ground,
    transitionStations(ground, breaks, radius, step, MAX_DESIGN_STATIONS - ground.length),
    step / 2,
  );
  const fine: FineStretch[] = breaks.map((b) => ({ fromFt: b - radius, toFt: b + radius, stepFt: step }));
  const denseKeep = new Set([...keep, ...dense.map((p) => p.stationFt).filter((s) => !surveyed.has(s))]);
  const layout: Layout = {
    ground: dense,
    vertices: designVertices(dense, denseKeep, fine),
    crestFt: crestStation(first.design!),
    near: first.design,
  };
  if (dense.length === ground.length && layout.vertices.length === base.vertices.length) return undefined;
  const second = designOn(job, layout);
  return second.design && earthMoved(dense, second.design) < earthMoved(first.ground, first.design!) - 1e-9
    ? second
    : undefined;
}

/** Only a design sitting exactly on a limit needs the margin gone; the exact check still has the last word. */
function designWithMargin(job: Job, layout: Layout): DesignFound {
  const found = designOn(job, layout);
  if (found.design) return found;
  const exact = designOn({ ...job, margin: 0 }, layout);
  return exact.design ? exact : found;
}
