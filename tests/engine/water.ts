interface Point {
  stationFt: number;
  elevationFt: number;
}

const EPS = 1e-6;

/**
 * A profile holds water when, once it has fallen (away from the road), it rises again: the lowest point between
 * is ringed by higher ground. Falling from the road edge and then rising is the same trap against the road.
 * Written for the tests, independently of the proposal's model.
 */
export function holdsWater(points: readonly Point[]): boolean {
  let fallen = false;
  for (let i = 0; i + 1 < points.length; i++) {
    const rise = (points[i + 1].elevationFt - points[i].elevationFt) / (points[i + 1].stationFt - points[i].stationFt);
    if (rise < -EPS) fallen = true;
    else if (rise > EPS && fallen) return true;
  }
  return false;
}

/** How many times the grade turns between rising and falling (flat runs do not count). */
export function directionChanges(points: readonly Point[]): number {
  let last = 0;
  let changes = 0;
  for (let i = 0; i + 1 < points.length; i++) {
    const d = points[i + 1].elevationFt - points[i].elevationFt;
    const sign = Math.abs(d) <= EPS ? 0 : Math.sign(d);
    if (sign === 0) continue;
    if (last !== 0 && sign !== last) changes++;
    last = sign;
  }
  return changes;
}
