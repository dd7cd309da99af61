const GRAVITY = 32.2;

function section(diameterFt: number, depthFt: number) {
  const theta = 2 * Math.acos(1 - (2 * depthFt) / diameterFt);
  return { area: ((diameterFt * diameterFt) / 8) * (theta - Math.sin(theta)), top: diameterFt * Math.sin(theta / 2) };
}

/** Critical depth in a circular pipe, by bisection on Q^2 T = g A^3; a flow that fills the pipe gives (just under) D. */
export function criticalDepthFt(diameterFt: number, flowCfs: number): number {
  let lo = diameterFt * 1e-6;
  let hi = diameterFt * (1 - 1e-9);
  for (let i = 0; i < 100; i++) {
    const mid = (lo + hi) / 2;
    const { area, top } = section(diameterFt, mid);
    if (flowCfs * flowCfs * top > GRAVITY * area ** 3) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

/** Specific head at critical depth in a circular pipe: dc + Vc^2 / 2g. */
export function criticalSpecificHeadFt(diameterFt: number, flowCfs: number): number {
  const depth = criticalDepthFt(diameterFt, flowCfs);
  const velocity = flowCfs / section(diameterFt, depth).area;
  return depth + (velocity * velocity) / (2 * GRAVITY);
}
