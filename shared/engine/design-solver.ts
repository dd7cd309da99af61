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

export function openLinear(highs: Highs, m: LinearModel): OpenLinear {
  const numCols = m.cost.length;
  const hasBinary = m.binary.some((b) => b === 1);
  const model = highs.createModel({
    numCols,
    numRows: m.rows.count,
    colCost: m.cost,
    colLower: m.colLower,
    colUpper: m.colUpper,
    rowLower: Float64Array.from(m.rows.lower),
    rowUpper: Float64Array.from(m.rows.upper),
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
  const range = (from: number, count: number) => ({ kind: 'range' as const, from, to: from + count - 1 });
  return {
    setColBounds(first, lower, upper) {
      if (lower.length > 0) model.changeColsBounds(range(first, lower.length), lower, upper);
    },
    setRowBounds(first, lower, upper) {
      if (lower.length > 0) model.changeRowsBounds(range(first, lower.length), lower, upper);
    },
    run() {
      const run = model.run();
      const codes = highs.constants.modelStatus;
      const status = run.modelStatus;
      if (status === codes.infeasible) return { status: 'infeasible', detail: 'infeasible' };
      if (status === codes.optimal) return { status: 'optimal', x: model.getSolution().colValue };
      // A node limit ends the search with the best design found so far, which still meets every row.
      if (hasIncumbent(model)) return { status: 'limit', x: model.getSolution().colValue };
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
