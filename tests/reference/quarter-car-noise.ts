/**
 * Quarter car driven by white road velocity u = żr, written in the test independently of the
 * project's code. States x = (zs − zr, żs, zu − zr, żu) are stationary although zr itself is a
 * random walk. Optional: the ISO 2631-1 Wk weighting (Annex A stages in docs/model.md §5) appended as
 * four second-order sections in controllable form, fed by the body acceleration.
 */
export interface Corner {
  ms: number;
  mu: number;
  ks: number;
  c: number;
  kt: number;
  ct: number;
}

export interface NoiseModel {
  A: number[][];
  B: number[];
  /** Output rows over the state: body acceleration, travel, dynamic tyre load (ct = 0 only), Wk-weighted body acceleration (when appended). */
  bodyAccel: number[];
  travel: number[];
  tyreLoad: number[];
  weighted?: number[];
}

export function noiseModel(k: Corner, withWk = false): NoiseModel {
  const { ms, mu, ks, c, kt, ct } = k;
  const core = [
    [0, 1, 0, 0],
    [-ks / ms, -c / ms, ks / ms, c / ms],
    [0, 0, 0, 1],
    [ks / mu, c / mu, -(ks + kt) / mu, -(c + ct) / mu],
  ];
  const bodyAccel = core[1].slice();
  const model: NoiseModel = {
    A: core,
    B: [-1, 0, -1, ct / mu],
    bodyAccel,
    travel: [-1, 0, 1, 0],
    // −kt(zu − zr) − ct(żu − żr): the ct·żr part is white and has no finite variance, so this row is only used with ct = 0.
    tyreLoad: [0, 0, -kt, -ct],
  };
  if (!withWk) return model;

  const tp = 2 * Math.PI;
  const w1 = tp * 0.4;
  const w2 = tp * 100;
  const w3 = tp * 12.5;
  const w4 = tp * 12.5;
  const w5 = tp * 2.37;
  const w6 = tp * 3.35;
  // (b2 s² + b1 s + b0) / (s² + a1 s + a0)
  const stages = [
    { b: [0, 0, 1], a: [w1 * w1, w1 * Math.SQRT2] },
    { b: [w2 * w2, 0, 0], a: [w2 * w2, w2 * Math.SQRT2] },
    { b: [(w4 * w4 * w3) / w3, (w4 * w4) / w3, 0], a: [w4 * w4, w4 / 0.63] },
    { b: [w5 * w5, w5 / 0.91, 1], a: [w6 * w6, w6 / 0.91] },
  ];
  const n = 4 + 2 * stages.length;
  const A = Array.from({ length: n }, (_, i) => (i < 4 ? [...core[i], ...new Array(n - 4).fill(0)] : new Array(n).fill(0)));
  // Input of the current stage as a row over the full state (no direct feed from u: body
  // acceleration depends on states only).
  let input = [...bodyAccel, ...new Array(n - 4).fill(0)];
  stages.forEach((st, s) => {
    const i1 = 4 + 2 * s;
    const i2 = i1 + 1;
    const [b0, b1, b2] = st.b;
    const [a0, a1] = st.a;
    A[i1][i2] += 1;
    for (let j = 0; j < n; j++) A[i2][j] += input[j];
    A[i2][i1] -= a0;
    A[i2][i2] -= a1;
    // y = (b0 − b2 a0) ξ1 + (b1 − b2 a1) ξ2 + b2 v
    const out = input.map((v) => b2 * v);
    out[i1] += b0 - b2 * a0;
    out[i2] += b1 - b2 * a1;
    input = out;
  });
  return {
    A,
    B: [...model.B, ...new Array(n - 4).fill(0)],
    bodyAccel: [...bodyAccel, ...new Array(n - 4).fill(0)],
    travel: [...model.travel, ...new Array(n - 4).fill(0)],
    tyreLoad: [...model.tyreLoad, ...new Array(n - 4).fill(0)],
    weighted: input,
  };
}
