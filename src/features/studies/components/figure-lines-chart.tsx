import { useMemo } from 'react';
import type uPlot from 'uplot';
import type { StudyFigureKey } from '../../../../shared/schemas/study.ts';
import { linearX } from '../../../components/charts/axes.ts';
import { seriesColor, themedAxis, themedSeries } from '../../../components/charts/chart-theme.ts';
import { type ChartOptions, UChart, useChartTheme } from '../../../components/charts/uplot-chart.tsx';
import { studyFigureInfo } from '../../../../shared/study/figures.ts';
import { studyParameterInfo } from '../../../../shared/study/describe-point.ts';
import { figureLines } from '../model/chart-data.ts';
import { useStudyDisplay } from '../model/display.ts';
import type { StudyView } from '../model/study-view.ts';

/** One figure against one swept parameter, a line per road and speed (the runs themselves, before they are combined). */
export function FigureLinesChart({ view, figure, along, holdAt, roadNames }: { view: StudyView; figure: StudyFigureKey; along: 0 | 1; holdAt: number; roadNames: readonly string[] }) {
  const theme = useChartTheme();
  const d = useStudyDisplay();
  const lines = useMemo(() => figureLines(view, figure, along, holdAt, roadNames, d), [view, figure, along, holdAt, roadNames, d]);
  const parameter = (view.definition.axes[along] ?? view.definition.axes[0]).parameter;
  const labels = lines.lines.map((l) => l.label).join('|');
  const options = useMemo<ChartOptions>(() => {
    const fUnit = d.figureSymbol(figure);
    const pUnit = d.parameterSymbol(parameter);
    return {
      height: 260,
      scales: { x: linearX },
      axes: [themedAxis(theme, { label: studyParameterInfo[parameter].label, unit: pUnit }), themedAxis(theme, { label: studyFigureInfo[figure].label, unit: fUnit, size: 60 })],
      series: [{ label: studyParameterInfo[parameter].label }, ...labels.split('|').filter(Boolean).map((label, i) => themedSeries({ label, unit: fUnit, color: seriesColor(theme, i), points: true, width: 1.5 }))],
    };
  }, [theme, figure, parameter, labels, d]);
  const data = useMemo<uPlot.AlignedData>(() => [lines.x, ...lines.lines.map((l) => l.y)], [lines]);
  return <UChart options={options} data={data} exportName={studyFigureInfo[figure].label} label={`${studyFigureInfo[figure].label} against ${studyParameterInfo[parameter].label}`} />;
}
