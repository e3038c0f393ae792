import type uPlot from 'uplot';
import type { Damper } from '../../../../shared/schemas/setup.ts';

/**
 * Both directions on one plot with signed velocity: compression to the right with positive
 * force, rebound to the left with negative force, joined at the origin. uPlot wants one rising
 * x column, so each series is null where the other one has its points.
 */
export interface SignedCurveData {
  data: uPlot.AlignedData;
  /** Index in the x column of each table point, per direction (for drag handles). */
  index: { compression: number[]; rebound: number[] };
}

export function signedCurveData(damper: Pick<Damper, 'compression' | 'rebound'>): SignedCurveData {
  const reb = damper.rebound.filter(([v]) => v > 0);
  const comp = damper.compression.filter(([v]) => v > 0);
  const x: number[] = [];
  const c: (number | null)[] = [];
  const r: (number | null)[] = [];
  const index = { compression: [] as number[], rebound: [] as number[] };
  for (let i = reb.length - 1; i >= 0; i--) {
    index.rebound[i] = x.length;
    x.push(-reb[i][0]);
    c.push(null);
    r.push(-reb[i][1]);
  }
  x.push(0);
  c.push(0);
  r.push(0);
  for (let i = 0; i < comp.length; i++) {
    index.compression[i] = x.length;
    x.push(comp[i][0]);
    c.push(comp[i][1]);
    r.push(null);
  }
  // a table point at 0 m/s sits on the shared origin
  const shift = (d: 'compression' | 'rebound') => {
    if (damper[d][0]?.[0] === 0) index[d] = [reb.length, ...index[d]];
  };
  shift('compression');
  shift('rebound');
  return { data: [x, c, r], index };
}
