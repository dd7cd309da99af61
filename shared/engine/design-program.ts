import type { Basis, Highs } from 'highs';
import { openLinear, type OpenLinear, type SolveOutcome } from './design-solver';
import { buildLeastEarthModel, type DesignModel, type SegmentRanges } from './least-earth-model';
import type { ProfilePoint } from './profile';
import type { RuleProfile } from './rule-profile';

export interface ProgramSpec {
  ground: readonly ProfilePoint[];
  vertices: readonly number[];
  ranges: readonly SegmentRanges[];
  rules: RuleProfile;
  roadEdgeFt: number;
  targetEndFt: number | undefined;
  margin: number;
  /** The road side in front of the first station, fixed, for the clearance rows. */
  before?: readonly ProfilePoint[];
  /** A design close to the answer (elevation at each vertex) and its crest, for the solver to start from. */
  near?: { at: Float64Array; k: number };
}

/**
 * One least-earth programme for one set of stations, loaded into the solver once. The crest positions and
 * clearance shares tried on it only change bounds, so the solver restarts each from the last basis instead of
 * from nothing: on a long survey that is a few hundred simplex steps instead of thousands.
 */
export class DesignProgram {
  readonly built: DesignModel;
  private readonly open: OpenLinear;
  private relaxedBasis: Basis | undefined;
  private last: 'relaxed' | number | undefined;

  constructor(highs: Highs, spec: ProgramSpec) {
    const share = new Float64Array(spec.vertices.length).fill(1);
    const budget = { vehicle: spec.rules.designVehicle, share, before: spec.before };
    this.built = buildLeastEarthModel(
      spec.ground,
      spec.vertices,
      spec.ranges,
      spec.rules,
      spec.roadEdgeFt,
      spec.targetEndFt,
      budget,
      'relaxed',
      spec.margin,
    );
    this.open = openLinear(highs, this.built.model, spec.near && this.built.startAt(spec.near.at, spec.near.k));
  }

  /** Directions relaxed or the first k rising; clearance rows scaled by share, or left out when none is given. */
  solve(share: Float64Array | undefined, directions: 'relaxed' | number): SolveOutcome {
    const { directionCols: d, clearance: c } = this.built;
    if (directions === 'relaxed') this.open.setColBounds(d.first, d.lower, d.upper);
    else {
      const fixed = Float64Array.from(d.lower, (_, j) => (j < directions ? 1 : 0));
      this.open.setColBounds(d.first, fixed, fixed);
      // Every crest position is a rounding of the relaxation, so each starts from its basis, not the last try's.
      // A tighter clearance at the same crest starts from where that crest left off.
      if (this.relaxedBasis && directions !== this.last) this.open.restoreBasis(this.relaxedBasis);
    }
    const upper = Float64Array.from(c.vertex, (v, r) => (share ? c.clearanceFt * share[v] - c.fixedFt[r] : Infinity));
    this.open.setRowBounds(c.first, new Float64Array(upper.length).fill(-Infinity), upper);
    const out = this.open.run();
    this.last = directions;
    if (directions === 'relaxed') this.relaxedBasis = out.status === 'optimal' ? this.open.saveBasis() : undefined;
    return out;
  }

  dispose(): void {
    this.open.dispose();
  }
}
