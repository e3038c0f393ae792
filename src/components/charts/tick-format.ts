/** Compact number for ticks and legend values (3 significant figures, no trailing zeros). */
export function formatTick(v: number | null): string {
  // uPlot hands null for gaps and for ticks its filter dropped
  if (v == null || Number.isNaN(v)) return '';
  if (v === 0) return '0';
  const abs = Math.abs(v);
  if (abs >= 1e5 || abs < 1e-3) return v.toExponential(2).replace(/\.?0+e/, 'e').replaceAll('-', '−');
  return Number(v.toPrecision(3)).toString().replaceAll('-', '−');
}
