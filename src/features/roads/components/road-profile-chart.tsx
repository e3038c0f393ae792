import { useMemo } from 'react';
import { linearX } from '../../../components/charts/axes.ts';
import { seriesColor, themedAxis, themedSeries } from '../../../components/charts/chart-theme.ts';
import { type ChartOptions, UChart, useChartTheme } from '../../../components/charts/uplot-chart.tsx';
import type { ProfilePreview } from '../model/preview.ts';

/** Elevation along the road (or against time for a sweep), in mm. */
export function RoadProfileChart({ profile }: { profile: ProfilePreview }) {
  const theme = useChartTheme();
  const options = useMemo<ChartOptions>(
    () => ({
      height: 220,
      scales: { x: linearX },
      axes: [
        themedAxis(theme, profile.axis === 'time' ? { label: 'Time', unit: 's' } : { label: 'Distance', unit: 'm' }),
        themedAxis(theme, { label: 'Elevation', unit: 'mm', size: 56 }),
      ],
      series: [{ label: profile.axis === 'time' ? 'Time' : 'Distance' }, themedSeries({ label: 'Elevation', unit: 'mm', color: seriesColor(theme, 6), width: 1 })],
    }),
    [theme, profile.axis],
  );
  const data = useMemo(() => [profile.x, profile.z] as [Float64Array, Float64Array], [profile]);
  return <UChart options={options} data={data} label="Road profile" exportName="road-profile" />;
}
