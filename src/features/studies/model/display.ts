import type { StudyFigureKey, StudyParameter } from '../../../../shared/schemas/study.ts';
import { studyFigureInfo } from '../../../../shared/study/figures.ts';
import { studyParameterInfo } from '../../../../shared/study/describe-point.ts';
import { formatSig, units, type UnitName } from '../../../lib/format.ts';

/**
 * How studies show figures and swept values: the display unit of each (conversions at the UI
 * edge; everything else stays SI), and short words for tables and axes.
 */

export const figureUnit: Record<StudyFigureKey, UnitName> = {
  bodyAccelRms: 'mps2',
  bodyAccelPeak: 'mps2',
  bodyAccelCrest: 'ratio',
  bodyAccelWkRms: 'mps2',
  vdv: 'mps175',
  mtvv: 'mps2',
  tyreLoadRms: 'N',
  tyreLoadRatio: 'percent',
  tyreLoadMin: 'N',
  liftOffFraction: 'percent',
  travelRms: 'mm',
  travelMaxCompression: 'mm',
  travelMaxExtension: 'mm',
  strokeUsedCompression: 'percent',
  strokeUsedExtension: 'percent',
  strokeUsed: 'percent',
  bumpStopTime: 's',
  reboundStopTime: 's',
  damperVelocityRms: 'mps',
  damperPowerMean: 'W',
  damperEnergy: 'J',
  staticSag: 'mm',
  endOfStrokeDepth: 'mm',
  bodyDampingRatioOnRoad: 'ratio',
};

/** Parameters are entered and shown in these units (spring and tyre rates per mm, as the trade quotes them). */
export const parameterUnit: Record<StudyParameter, UnitName> = {
  damperScale: 'ratio',
  compressionScale: 'ratio',
  reboundScale: 'ratio',
  targetBodyDampingRatio: 'ratio',
  springRate: 'Npermm',
  tyreRate: 'Npermm',
  unsprungMass: 'kg',
  gasForce: 'N',
  speed: 'mps',
};

/** The display unit symbol of a figure ('' for a plain ratio). */
export const figureSymbol = (key: StudyFigureKey): string => units[figureUnit[key]].symbol;

/** "Wk-weighted body acceleration" → with its unit symbol in brackets when it has one. */
export function figureLabel(key: StudyFigureKey, withUnit = true): string {
  const symbol = figureSymbol(key);
  const label = studyFigureInfo[key].label;
  return withUnit && symbol ? `${label} [${symbol}]` : label;
}

export function parameterLabel(p: StudyParameter, withUnit = true): string {
  const symbol = p.endsWith('Scale') ? '×' : units[parameterUnit[p]].symbol;
  const label = studyParameterInfo[p].label;
  return withUnit && symbol ? `${label} [${symbol}]` : label;
}

/** A figure's SI value in its display unit, as a number (charts) or text (tables). */
export const figureToDisplay = (key: StudyFigureKey, si: number) => units[figureUnit[key]].fromSI(si);
export const figureText = (key: StudyFigureKey, si: number | undefined | null, digits = 3) => (si === undefined || si === null ? '—' : formatSig(figureToDisplay(key, si), digits));

export const parameterToDisplay = (p: StudyParameter, si: number) => units[parameterUnit[p]].fromSI(si);
export const parameterToSI = (p: StudyParameter, shown: number) => units[parameterUnit[p]].toSI(shown);
export const parameterText = (p: StudyParameter, si: number, digits = 3) => formatSig(parameterToDisplay(p, si), digits);
