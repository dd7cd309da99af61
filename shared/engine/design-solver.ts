import loadHighs, { type Basis, type Highs } from 'highs';
import type { SparseRows } from './sparse-rows';

/**
 * HiGHS, compiled to WebAssembly and shipped with the package (the browser build serves highs.wasm as one of
 * its own assets; nothing is fetched from anywhere else). Loading is asynchronous, solving is not, so the
 * loaded runtime is kept for the life of the process or worker.
 */
let runtime: Promise<Highs> | undefined;
export function designSolver(): Promise<Highs> {
  runtime ??= loadHighs();
  return runtime;
}

export interface LinearModel {
  cost: Float64Array;
  colLower: Float64Array;
  colUpper: Float64Array;
  /** Columns that take only 0 or 1. */
  binary: Uint8Array;
  rows: SparseRows;
}

export type SolveOutcome =
  | { status: 'optimal'; x: Float64Array }
  | { status: 'limit'; x: Float64Array }
  | { status: 'infeasible'; detail: string }
  | { status: 'failed'; detail: string };

// A branch-and-bound search on a long survey could run for a long time; a node limit is deterministic where a
// time limit is not, and the best design found by then is still a design that meets every limit.
const MIP_NODE_LIMIT = 400;
const MIP_GAP = 0.002;

export function solveLinear(highs: Highs, m: LinearModel): SolveOutcome {
  const open = openLinear(highs, m);
  try {
    return open.run();
  } finally {
    open.dispose();
  }
}

/** A programme loaded once; bounds can change between runs and each run starts from the last basis. */
export interface OpenLinear {
  setColBounds(first: number, lower: Float64Array, upper: Float64Array): void;
  setRowBounds(first: number, lower: Float64Array, upper: Float64Array): void;
  run(): SolveOutcome;
  /** The current basis, to start a later run from (see restoreBasis). */
  saveBasis(): Basis;
  restoreBasis(basis: Basis): void;
  dispose(): void;
}

/**
 * A starting point for the first run: the programme is loaded shifted so that `origin` is its zero, and the
 * solver starts from the basis given, which is read relative to that point (free columns nonbasic at zero sit
 * at the origin).
 */
export interface LinearStart {
  origin: Float64Array;
  basis: Basis;
}

export function openLinear(highs: Highs, m: LinearModel, start?: LinearStart): OpenLinear {
  const numCols = m.cost.length;
  const origin = start?.origin;
  // Each row's activity at the origin, taken off its bounds so the shifted programme is the same programme.
  const rowShift = new Float64Array(m.rows.count);
  if (origin) {
    const { starts, indices, values } = m.rows;
    for (let r = 0; r < rowShift.length; r++) {
      let sum = 0;
      for (let at = starts[r]; at < starts[r + 1]; at++) sum += values[at] * origin[indices[at]];
      rowShift[r] = sum;
    }
  }
  const shifted = (xs: ArrayLike<number>, shift: ArrayLike<number> | undefined, from = 0) => {
    const out = new Float64Array(xs.length);
    if (shift) for (let i = 0; i < out.length; i++) out[i] = xs[i] - shift[from + i];
    else out.set(xs);
    return out;
  };
  const hasBinary = m.binary.some((b) => b === 1);
  const model = highs.createModel({
    numCols,
    numRows: m.rows.count,
    colCost: m.cost,
    colLower: shifted(m.colLower, origin),
    colUpper: shifted(m.colUpper, origin),
    rowLower: shifted(m.rows.lower, origin && rowShift),
    rowUpper: shifted(m.rows.upper, origin && rowShift),
    matrix: {
      format: 'csr',
      numRows: m.rows.count,
      numCols,
      starts: Int32Array.from(m.rows.starts),
      indices: Int32Array.from(m.rows.indices),
      values: Float64Array.from(m.rows.values),
    },
    integrality: hasBinary ? Int32Array.from(m.binary) : undefined,
  });
  // Serial dual simplex measured fastest on these chain-shaped programmes (200 and 2,000 stations), and it
  // restarts from the last basis after a bound changes. Devex pricing (edge weight strategy 1) measured about
  // twice as fast as the default steepest edge at 2,000 stations: its weights cost nothing to set up, and a
  // restart after a large bound change does not pay to recompute them. A MIP must keep the default choice or
  // HiGHS would drop the integrality. Presolve is off: these chain-shaped programmes leave it little to remove,
  // and without it the first solve of each programme measured about a sixth faster at 200 stations. Scaling
  // is off too: the coefficients are grades and station spacings within a few orders of each other, and
  // unscaled the bench grounds took 3-29% fewer simplex steps to designs moving the same earth.
  model.options.set(
    hasBinary
      ? { output_flag: false, mip_rel_gap: MIP_GAP, mip_max_nodes: MIP_NODE_LIMIT }
      : {
          output_flag: false,
          simplex_scale_strategy: 0,
          presolve: 'off',
          solver: 'simplex',
          simplex_strategy: 1,
          simplex_dual_edge_weight_strategy: 1,
          primal_feasibility_tolerance: 1e-9,
        },
  );
  // The start's basis is near the answer in the primal sense only (its free columns still have to enter), so
  // its first run is primal simplex: measured about 230 steps instead of about 600 from nothing on the plain
  // bench ground's curve programme. Dual simplex from that basis first needs a dual phase and measured slower.
  let primalFirst = false;
  if (start) {
    try {
      model.setBasis(start.basis);
      model.options.set({ simplex_strategy: 4 });
      primalFirst = true;
    } catch {
      // A basis HiGHS will not take leaves the run to start from nothing, as without a start.
    }
  }
  const range = (from: number, count: number) => ({ kind: 'range' as const, from, to: from + count - 1 });
  const solution = () => {
    const x = model.getSolution().colValue;
    if (origin) for (let i = 0; i < x.length; i++) x[i] += origin[i];
    return x;
  };
  return {
    setColBounds(first, lower, upper) {
      if (lower.length > 0)
        model.changeColsBounds(
          range(first, lower.length),
          shifted(lower, origin, first),
          shifted(upper, origin, first),
        );
    },
    setRowBounds(first, lower, upper) {
      if (lower.length > 0)
        model.changeRowsBounds(
          range(first, lower.length),
          shifted(lower, origin && rowShift, first),
          shifted(upper, origin && rowShift, first),
        );
    },
    run() {
      const codes = highs.constants.modelStatus;
      let run = model.run();
      if (primalFirst) {
        // Later runs change bounds only, which dual simplex restarts from best.
        model.options.set({ simplex_strategy: 1 });
        primalFirst = false;
        // A start that left the solver neither at an optimum nor sure of infeasibility is dropped: the same
        // programme is run again from nothing, as it would have been without a start.
        if (run.modelStatus !== codes.optimal && run.modelStatus !== codes.infeasible) {
          model.setBasis();
          run = model.run();
        }
      }
      const status = run.modelStatus;
      if (status === codes.infeasible) return { status: 'infeasible', detail: 'infeasible' };
      if (status === codes.optimal) return { status: 'optimal', x: solution() };
      // A node limit ends the search with the best design found so far, which still meets every row.
      if (hasIncumbent(model)) return { status: 'limit', x: solution() };
      return { status: 'failed', detail: `solver status ${status}` };
    },
    saveBasis: () => model.getBasis(),
    restoreBasis(basis) {
      model.setBasis(basis);
    },
    dispose: () => model.dispose(),
  };
}

function hasIncumbent(model: { info: { get(name: string): unknown } }): boolean {
  const feasible = model.info.get('primal_solution_status');
  return feasible === 2;
}
