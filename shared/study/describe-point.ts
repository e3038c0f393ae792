import type { StudyParameter } from '../schemas/study.ts';
import type { StudyPointValues } from '../schemas/study-result.ts';

/** Words and number format per parameter, SI (the UI may pass its own for other units). */
export const studyParameterInfo: Record<StudyParameter, { label: string; unit: string; format: (x: number) => string }> = {
  damperScale: { label: 'damper scale', unit: '×', format: (x) => `damper ×${x.toFixed(2)}` },
  compressionScale: { label: 'compression scale', unit: '×', format: (x) => `compression ×${x.toFixed(2)}` },
  reboundScale: { label: 'rebound scale', unit: '×', format: (x) => `rebound ×${x.toFixed(2)}` },
  targetBodyDampingRatio: { label: 'body damping ratio (table slope)', unit: '', format: (x) => `body damping ratio ${x.toFixed(3)} by table slope` },
  springRate: { label: 'spring rate', unit: 'N/m', format: (x) => `spring rate ${group(x)} N/m` },
  tyreRate: { label: 'tyre rate', unit: 'N/m', format: (x) => `tyre rate ${group(x)} N/m` },
  unsprungMass: { label: 'unsprung mass', unit: 'kg', format: (x) => `unsprung mass ${group(x)} kg` },
  gasForce: { label: 'gas force', unit: 'N', format: (x) => `gas force ${group(x)} N` },
  mountRate: { label: 'top mount rate', unit: 'N/m', format: (x) => `top mount ${group(x)} N/m` },
  frictionBreakaway: { label: 'strut friction', unit: 'N', format: (x) => `friction ${group(x)} N` },
  skyGain: { label: 'skyhook gain', unit: 'N·s/m', format: (x) => `skyhook ${group(x)} N·s/m` },
  groundGain: { label: 'groundhook gain', unit: 'N·s/m', format: (x) => `groundhook ${group(x)} N·s/m` },
  controlBlend: { label: 'skyhook share', unit: '', format: (x) => `skyhook share ${x.toFixed(2)}` },
  controlOn: { label: 'control (0 passive, 1 on)', unit: '', format: (x) => (x >= 0.5 ? 'controlled' : 'passive') },
  speed: { label: 'speed', unit: 'm/s', format: (x) => `speed ${group(x)} m/s` },
};

/** Three significant figures, thousands set off by spaces: 28460 → "28 500", 0.3456 → "0.346". */
export function group(x: number): string {
  const r = Number(x.toPrecision(3));
  const [int, frac] = Math.abs(r).toString().split('.');
  const grouped = int.length > 4 ? int.replace(/\B(?=(\d{3})+(?!\d))/g, ' ') : int;
  return `${r < 0 ? '−' : ''}${grouped}${frac ? `.${frac}` : ''}`;
}

/**
 * A point named by its swept values in axis order, e.g. "rebound ×1.20, spring rate 28 000 N/m";
 * "the base setup" when it has none.
 */
export function describePoint(
  axes: readonly { parameter: StudyParameter }[],
  values: StudyPointValues,
  format: Partial<Record<StudyParameter, (x: number) => string>> = {},
): string {
  const parts = axes.flatMap(({ parameter }) => {
    const v = values[parameter];
    return v === undefined ? [] : [(format[parameter] ?? studyParameterInfo[parameter].format)(v)];
  });
  return parts.length ? parts.join(', ') : 'the base setup';
}
