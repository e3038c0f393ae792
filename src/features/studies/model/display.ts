import { DEFAULT_UNIT_PREFERENCES } from '../../../../shared/schemas/unit-preferences.ts';
import type { StudyFigureKey, StudyParameter } from '../../../../shared/schemas/study.ts';
import { studyFigureInfo } from '../../../../shared/study/figures.ts';
import { describePoint, studyParameterInfo } from '../../../../shared/study/describe-point.ts';
import { pointValuesAt } from '../../../../shared/study/expand.ts';
import { type DisplayUnit, formatSig, units, type UnitName } from '../../../lib/format.ts';
import { chosenUnits, type ChosenUnits, type QuantityKind } from '../../../lib/units/unit-table.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { useMemo } from 'react';

/**
 * How studies show figures and swept values: the display unit of each (conversions at the UI
 * edge; everything else stays SI), and short words for tables and axes. Lengths, damper speeds,
 * rates and road speeds follow the person's chosen units; the rest have one fixed unit.
 */

/** A fixed unit by name, or the kind of quantity whose unit the person chooses. */
type StudyUnit = UnitName | QuantityKind;

const figureUnitOf: Record<StudyFigureKey, StudyUnit> = {
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
  travelRms: 'length',
  travelMaxCompression: 'length',
  travelMaxExtension: 'length',
  strokeUsedCompression: 'percent',
  strokeUsedExtension: 'percent',
  strokeUsed: 'percent',
  bumpStopTime: 's',
  reboundStopTime: 's',
  damperVelocityRms: 'damperVelocity',
  damperPowerMean: 'W',
  damperEnergy: 'J',
  staticSag: 'length',
  endOfStrokeDepth: 'length',
  bodyDampingRatioOnRoad: 'ratio',
};

const parameterUnitOf: Record<StudyParameter, StudyUnit> = {
  damperScale: 'ratio',
  compressionScale: 'ratio',
  reboundScale: 'ratio',
  targetBodyDampingRatio: 'ratio',
  springRate: 'rate',
  tyreRate: 'rate',
  unsprungMass: 'kg',
  gasForce: 'N',
  mountRate: 'rate',
  frictionBreakaway: 'N',
  skyGain: 'Nspm',
  groundGain: 'Nspm',
  controlBlend: 'ratio',
  controlOn: 'ratio',
  speed: 'speed',
};

const isScale = (p: StudyParameter) => p.endsWith('Scale');

/** Study words and numbers in one person's units. */
export interface StudyDisplay {
  units: ChosenUnits;
  figureUnit: (key: StudyFigureKey) => DisplayUnit;
  parameterUnit: (p: StudyParameter) => DisplayUnit;
  /** The display unit symbol of a figure ('' for a plain ratio). */
  figureSymbol: (key: StudyFigureKey) => string;
  /** A parameter's symbol: '×' for scales, '' for a plain ratio. */
  parameterSymbol: (p: StudyParameter) => string;
  /** "Wk-weighted body acceleration" → with its unit symbol in brackets when it has one. */
  figureLabel: (key: StudyFigureKey, withUnit?: boolean) => string;
  parameterLabel: (p: StudyParameter, withUnit?: boolean) => string;
  /** A figure's SI value in its display unit, as a number (charts) or text (tables). */
  figureToDisplay: (key: StudyFigureKey, si: number) => number;
  figureText: (key: StudyFigureKey, si: number | undefined | null, digits?: number) => string;
  /** The same with its symbol after a thin space: "12.4 mm". */
  figureWithUnit: (key: StudyFigureKey, si: number) => string;
  parameterToDisplay: (p: StudyParameter, si: number) => number;
  parameterToSI: (p: StudyParameter, shown: number) => number;
  parameterText: (p: StudyParameter, si: number, digits?: number) => string;
  /** A swept value as a point is named by: "spring rate 28.0 N/mm", "rebound ×1.20". */
  parameterWords: Partial<Record<StudyParameter, (si: number) => string>>;
  /** A swept value with its unit, for limits and edges: "×1.20", "28.0 N/mm". */
  parameterWithUnit: (p: StudyParameter, si: number) => string;
}

export function studyDisplay(u: ChosenUnits): StudyDisplay {
  const resolve = (ref: StudyUnit): DisplayUnit => (ref in units ? units[ref as UnitName] : u[ref as QuantityKind]);
  const figureUnit = (key: StudyFigureKey) => resolve(figureUnitOf[key]);
  const parameterUnit = (p: StudyParameter) => resolve(parameterUnitOf[p]);
  const figureSymbol = (key: StudyFigureKey) => figureUnit(key).symbol;
  const parameterSymbol = (p: StudyParameter) => (isScale(p) ? '×' : parameterUnit(p).symbol);
  const figureToDisplay = (key: StudyFigureKey, si: number) => figureUnit(key).fromSI(si);
  const figureText = (key: StudyFigureKey, si: number | undefined | null, digits = 3) => (si === undefined || si === null ? '—' : formatSig(figureToDisplay(key, si), digits));
  const parameterToDisplay = (p: StudyParameter, si: number) => parameterUnit(p).fromSI(si);
  const parameterText = (p: StudyParameter, si: number, digits = 3) => formatSig(parameterToDisplay(p, si), digits);
  const parameterWithUnit = (p: StudyParameter, si: number) => (isScale(p) ? `×${parameterText(p, si)}` : `${parameterText(p, si)}\u2009${parameterUnit(p).symbol}`.trim());
  // Only the parameters whose unit is a choice are renamed; the others keep the shared words.
  const chosen = (Object.keys(parameterUnitOf) as StudyParameter[]).filter((p) => !(parameterUnitOf[p] in units));
  return {
    units: u,
    figureUnit,
    parameterUnit,
    figureSymbol,
    parameterSymbol,
    figureLabel: (key, withUnit = true) => {
      const symbol = figureSymbol(key);
      const label = studyFigureInfo[key].label;
      return withUnit && symbol ? `${label} [${symbol}]` : label;
    },
    parameterLabel: (p, withUnit = true) => {
      const symbol = parameterSymbol(p);
      const label = studyParameterInfo[p].label;
      return withUnit && symbol ? `${label} [${symbol}]` : label;
    },
    figureToDisplay,
    figureText,
    figureWithUnit: (key, si) => {
      const symbol = figureSymbol(key);
      return `${figureText(key, si)}${symbol ? `\u2009${symbol}` : ''}`;
    },
    parameterToDisplay,
    parameterToSI: (p, shown) => parameterUnit(p).toSI(shown),
    parameterText,
    parameterWords: Object.fromEntries(chosen.map((p) => [p, (si: number) => `${studyParameterInfo[p].label} ${parameterWithUnit(p, si)}`])),
    parameterWithUnit,
  };
}

/**
 * A saved point (best compromise, baseline) named in the reader's units from its sweep index;
 * the label stored with it (SI words) when the index is outside the sweep.
 */
export function savedPointName(d: StudyDisplay, axes: Parameters<typeof pointValuesAt>[0], point: { pointIndex: number; label: string }): string {
  const values = pointValuesAt(axes, point.pointIndex);
  return values ? describePoint(axes, values, d.parameterWords) : point.label;
}

/** The display of the default units (pages and tests outside a signed-in person's choice). */
export const defaultStudyDisplay = studyDisplay(chosenUnits({ ...DEFAULT_UNIT_PREFERENCES }));

/** Study words and numbers in the signed-in person's units. */
export function useStudyDisplay(): StudyDisplay {
  const u = useUnits();
  return useMemo(() => studyDisplay(u), [u]);
}
