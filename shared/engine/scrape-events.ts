import type { DesignVehicle } from './rule-profile';
import { bodyAt, type Ground, newCursor } from './scrape-drive';

/**
 * Rear-wheel positions, in increasing order, at which something under the vehicle changes: a wheel or an overhang
 * end passes over a ground vertex. Between two of them the clearance is a smooth function of position, so its
 * lowest points are at these positions or where a local search between samples finds them.
 */
export function vertexEvents(g: Ground, v: DesignVehicle): Float64Array {
  const { xs, ys } = g;
  const n = xs.length;
  const w = v.wheelbaseFt;
  const w2 = w * w;
  const events = new Float64Array(4 * n);
  let m = 0;
  for (let j = 0; j < n - 1; j++) events[m++] = xs[j];
  for (let j = 1; j < n; j++) {
    // The front wheel on vertex j: the rear contact at chord length w behind it, nearest first.
    for (let k = j - 1; k >= 0; k--) {
      const ox = xs[k] - xs[j];
      const oy = ys[k] - ys[j];
      const oc = ox * ox + oy * oy - w2;
      if (oc < 0) continue;
      const ex = xs[k + 1] - xs[k];
      const ey = ys[k + 1] - ys[k];
      const qa = ex * ex + ey * ey;
      const qb = 2 * (ox * ex + oy * ey);
      const disc = qb * qb - 4 * qa * oc;
      if (disc >= 0) events[m++] = xs[k] + Math.min(1, Math.max(0, (-qb + Math.sqrt(disc)) / (2 * qa))) * ex;
      break;
    }
  }
  // An overhang end over vertex i: its distance along the ground depends on the body's tilt, taken from the body
  // one overhang length back. Close is enough: a kink a hair off a sample still lies between two samples, where
  // the local search finds it.
  const cursor = newCursor();
  for (const along of [-v.rearOverhangFt, w + v.frontOverhangFt]) {
    if (along === 0) continue;
    for (let i = 0; i < n; i++) {
      const rx = xs[i] - along;
      events[m++] = rx >= xs[0] && rx < xs[n - 1] && bodyAt(g, v, rx, cursor) ? xs[i] - along * cursor.ux : rx;
    }
  }
  return events.subarray(0, m).sort();
}
