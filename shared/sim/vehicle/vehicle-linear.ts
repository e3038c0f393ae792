import type { Eigenvalue, ModeFigures } from '../../schemas/modal.ts';
import type { LinearCorner } from '../linear/linear-corner.ts';
import { eigenvalues } from '../linear/eigen.ts';
import { linearCorner } from '../quarter-car.ts';
import { dynamicIndex, type VehicleGeometry, type VehicleStatics } from './vehicle-model.ts';

/**
 * The pitch-plane vehicle reduced to linear elements at static equilibrium (each corner as
 * quarter-car.ts's `linearCorner` reduces it: wheel rate with the gas rate, the damper's
 * equivalent coefficient), axles doubled from their corners. Coordinates q = [z, θ, zf, zr]
 * as in vehicle-model.ts.
 */
export interface LinearAxle {
  unsprungMass: number;
  wheelRate: number;
  wheelDamping: number;
  tyreRate: number;
  tyreDamping: number;
}

export interface LinearVehicle {
  geometry: VehicleGeometry;
  front: LinearAxle;
  rear: LinearAxle;
}

const axleOf = (c: LinearCorner): LinearAxle => ({
  unsprungMass: 2 * c.unsprungMass,
  wheelRate: 2 * c.wheelRate,
  wheelDamping: 2 * c.wheelDamping,
  tyreRate: 2 * c.tyreRate,
  tyreDamping: 2 * c.tyreDamping,
});

export function linearVehicle(statics: VehicleStatics): LinearVehicle {
  return { geometry: statics.geometry, front: axleOf(linearCorner(statics.frontSetup)), rear: axleOf(linearCorner(statics.rearSetup)) };
}

/** Mass (diagonal), damping and stiffness matrices on q = [z, θ, zf, zr]. */
export function vehicleMatrices(v: LinearVehicle): { M: number[]; C: number[][]; K: number[][] } {
  const { mass, inertia, a, b } = v.geometry;
  const build = (sf: number, sr: number, tf: number, tr: number) => [
    [sf + sr, sf * a - sr * b, -sf, -sr],
    [sf * a - sr * b, sf * a * a + sr * b * b, -sf * a, sr * b],
    [-sf, -sf * a, sf + tf, 0],
    [-sr, sr * b, 0, sr + tr],
  ];
  return {
    M: [mass, inertia, v.front.unsprungMass, v.rear.unsprungMass],
    C: build(v.front.wheelDamping, v.rear.wheelDamping, v.front.tyreDamping, v.rear.tyreDamping),
    K: build(v.front.wheelRate, v.rear.wheelRate, v.front.tyreRate, v.rear.tyreRate),
  };
}

/** First-order form ẋ = A·x with x = [q, q̇]. */
export function vehicleStateMatrix(v: LinearVehicle): number[][] {
  const { M, C, K } = vehicleMatrices(v);
  const A = Array.from({ length: 8 }, () => new Array<number>(8).fill(0));
  for (let i = 0; i < 4; i++) {
    A[i][i + 4] = 1;
    for (let j = 0; j < 4; j++) {
      A[i + 4][j] = -K[i][j] / M[i];
      A[i + 4][j + 4] = -C[i][j] / M[i];
    }
  }
  return A;
}

export type Complex = [number, number];
const cmul = (x: Complex, y: Complex): Complex => [x[0] * y[0] - x[1] * y[1], x[0] * y[1] + x[1] * y[0]];
const cdiv = (x: Complex, y: Complex): Complex => {
  const d = y[0] * y[0] + y[1] * y[1];
  return [(x[0] * y[0] + x[1] * y[1]) / d, (x[1] * y[0] - x[0] * y[1]) / d];
};
const cabs = (x: Complex) => Math.hypot(x[0], x[1]);

/**
 * Solves the complex square system G·x = rhs by Gaussian elimination with complete pivoting.
 * With `rhs` null, G is taken as singular and a null vector is returned (the last pivot is
 * dropped and its unknown set to 1): a mode shape from the dynamic stiffness at an eigenvalue.
 */
export function solveComplex(G: Complex[][], rhs: Complex[] | null): Complex[] {
  const n = G.length;
  const A = G.map((row) => row.map((c): Complex => [c[0], c[1]]));
  const r = rhs ? rhs.map((c): Complex => [c[0], c[1]]) : Array.from({ length: n }, (): Complex => [0, 0]);
  const cols = Array.from({ length: n }, (_, i) => i);
  const last = rhs ? n : n - 1;
  for (let k = 0; k < last; k++) {
    let pi = k;
    let pj = k;
    let best = -1;
    for (let i = k; i < n; i++)
      for (let j = k; j < n; j++)
        if (cabs(A[i][j]) > best) {
          best = cabs(A[i][j]);
          pi = i;
          pj = j;
        }
    [A[k], A[pi]] = [A[pi], A[k]];
    [r[k], r[pi]] = [r[pi], r[k]];
    for (const row of A) [row[k], row[pj]] = [row[pj], row[k]];
    [cols[k], cols[pj]] = [cols[pj], cols[k]];
    for (let i = k + 1; i < n; i++) {
      const f = cdiv(A[i][k], A[k][k]);
      for (let j = k; j < n; j++) {
        const p = cmul(f, A[k][j]);
        A[i][j] = [A[i][j][0] - p[0], A[i][j][1] - p[1]];
      }
      const p = cmul(f, r[k]);
      r[i] = [r[i][0] - p[0], r[i][1] - p[1]];
    }
  }
  const x: Complex[] = Array.from({ length: n }, (): Complex => [0, 0]);
  if (!rhs) x[n - 1] = [1, 0];
  for (let k = last - 1; k >= 0; k--) {
    let s: Complex = [r[k][0], r[k][1]];
    for (let j = k + 1; j < n; j++) {
      const p = cmul(A[k][j], x[j]);
      s = [s[0] - p[0], s[1] - p[1]];
    }
    x[k] = cdiv(s, A[k][k]);
  }
  const out: Complex[] = new Array(n);
  for (let k = 0; k < n; k++) out[cols[k]] = x[k];
  return out;
}

/** Dynamic stiffness s²M + sC + K at a complex s. */
export function dynamicStiffness(v: LinearVehicle, s: Complex): Complex[][] {
  const { M, C, K } = vehicleMatrices(v);
  const s2 = cmul(s, s);
  return K.map((row, i) =>
    row.map((k, j): Complex => {
      const m = i === j ? M[i] : 0;
      return [k + m * s2[0] + C[i][j] * s[0], m * s2[1] + C[i][j] * s[1]];
    }),
  );
}

const TWO_PI = 2 * Math.PI;

export type VehicleModeName = 'heave' | 'pitch' | 'frontHop' | 'rearHop';

export interface VehicleMode extends ModeFigures {
  name: VehicleModeName;
  /** Mode shape (magnitudes, heave m, pitch rad, wheels m), scaled to its largest displacement. */
  shape: { heave: number; pitch: number; front: number; rear: number };
  /** Body modes: where the body does not move, m behind the front axle; null when it barely pitches. */
  nodeBehindFrontAxle: number | null;
}

export interface VehicleModes {
  modes: Record<VehicleModeName, VehicleMode>;
  eigenvalues: Eigenvalue[];
  dynamicIndex: number;
}

function figures(l: Eigenvalue, partner: Eigenvalue): ModeFigures {
  if (l.im !== 0) {
    const wn = Math.hypot(l.re, l.im);
    return { naturalHz: wn / TWO_PI, dampedHz: Math.abs(l.im) / TWO_PI, dampingRatio: -l.re / wn };
  }
  const wn = Math.sqrt(l.re * partner.re);
  return { naturalHz: wn / TWO_PI, dampedHz: 0, dampingRatio: -(l.re + partner.re) / (2 * wn) };
}

/**
 * The four modes: eigenvalues of the state matrix paired into modes (as the corner's modal.ts
 * does), each mode's shape from the null vector of the dynamic stiffness at its eigenvalue.
 * The two lower modes are the body's: heave is the one whose vertical motion at the CG is the
 * larger against its pitch times the radius of gyration; the two higher are the wheel hops,
 * named by the wheel that moves more.
 */
export function vehicleModes(v: LinearVehicle): VehicleModes {
  const lambdas = eigenvalues(vehicleStateMatrix(v));
  const complex = lambdas.filter((l) => l.im > 0);
  const real = lambdas.filter((l) => l.im === 0).sort((x, y) => Math.abs(x.re) - Math.abs(y.re));
  const found: Array<{ figures: ModeFigures; root: Eigenvalue }> = complex.map((l) => ({ figures: figures(l, l), root: l }));
  for (let i = 0; i + 1 < real.length; i += 2) found.push({ figures: figures(real[i], real[i + 1]), root: real[i] });
  if (found.length !== 4) throw new Error(`vehicleModes: expected four modes, got ${found.length}`);
  found.sort((x, y) => x.figures.naturalHz - y.figures.naturalHz);
  const { a } = v.geometry;
  const k = Math.sqrt(v.geometry.inertia / v.geometry.mass);
  const shaped = found.map(({ figures: f, root }) => {
    const x = solveComplex(dynamicStiffness(v, [root.re, root.im]), null);
    const mags = x.map(cabs);
    const scale = Math.max(mags[0] + k * mags[1], mags[2], mags[3]);
    // Node: z + x·θ = 0 at x = −z/θ ahead of the CG (the real part: the shape is near real).
    const ratio = mags[1] > 1e-12 * (mags[0] + 1e-300) ? cdiv(x[0], x[1]) : null;
    return {
      ...f,
      shape: { heave: mags[0] / scale, pitch: mags[1] / scale, front: mags[2] / scale, rear: mags[3] / scale },
      nodeBehindFrontAxle: ratio && Math.abs(ratio[0]) < 1e3 * v.geometry.wheelbase ? a + ratio[0] : null,
      heaveShare: mags[0] / (mags[0] + k * mags[1]),
    };
  });
  const [b1, b2, w1, w2] = shaped;
  const [heave, pitch] = b1.heaveShare >= b2.heaveShare ? [b1, b2] : [b2, b1];
  const [frontHop, rearHop] = w1.shape.front >= w1.shape.rear ? [w1, w2] : [w2, w1];
  const strip = (m: (typeof shaped)[number], name: VehicleModeName): VehicleMode => {
    const { heaveShare: _drop, ...rest } = m;
    const body = name === 'heave' || name === 'pitch';
    return { ...rest, nodeBehindFrontAxle: body ? rest.nodeBehindFrontAxle : null, name };
  };
  return {
    modes: { heave: strip(heave, 'heave'), pitch: strip(pitch, 'pitch'), frontHop: strip(frontHop, 'frontHop'), rearHop: strip(rearHop, 'rearHop') },
    eigenvalues: lambdas,
    dynamicIndex: dynamicIndex(v.geometry),
  };
}
