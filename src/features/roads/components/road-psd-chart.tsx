import { useMemo, useRef } from 'react';
import type uPlot from 'uplot';
import { isoClasses } from '../../../../shared/schemas/road.ts';
import { isoClassBounds } from '../../../../shared/sim/roads/iso-fit.ts';
import { ISO_N0 as N0 } from '../../../../shared/sim/roads/iso8608.ts';
import { logDecadeRange, logLogScales } from '../../../components/charts/axes.ts';
import { type ChartTheme, formatTick, seriesColor, themedAxis, themedSeries } from '../../../components/charts/chart-theme.ts';
import { type ChartOptions, UChart, useChartTheme } from '../../../components/charts/uplot-chart.tsx';
import type { PsdPreview } from '../model/preview.ts';

/** ISO 8608 class boundaries drawn with the standard waviness w = 2 (from memory: ISO 8608:2016). */
const BAND_WAVINESS = 2;

/**
 * Shaded strips for the ISO 8608 classes A–H under the series: each class spans half to twice
 * its geometric mean Gd(n0), sloping as n^−2. Drawn on the canvas so the legend lists only data.
 */
function drawIsoBands(theme: ChartTheme) {
  return (u: uPlot) => {
    const { ctx } = u;
    const xMin = u.scales.x.min;
    const xMax = u.scales.x.max;
    if (xMin == null || xMax == null) return;
    const line = (g0: number, n: number) => g0 * (n / N0) ** -BAND_WAVINESS;
    ctx.save();
    ctx.beginPath();
    ctx.rect(u.bbox.left, u.bbox.top, u.bbox.width, u.bbox.height);
    ctx.clip();
    const px = (n: number) => u.valToPos(n, 'x', true);
    const py = (g: number) => u.valToPos(g, 'y', true);
    ctx.font = `${Math.round(11 * devicePixelRatio)}px ${theme.sansFont}`;
    ctx.textBaseline = 'middle';
    isoClasses.forEach((cls, k) => {
      const { lower, upper } = isoClassBounds(cls);
      ctx.beginPath();
      ctx.moveTo(px(xMin), py(line(lower, xMin)));
      ctx.lineTo(px(xMax), py(line(lower, xMax)));
      ctx.lineTo(px(xMax), py(line(upper, xMax)));
      ctx.lineTo(px(xMin), py(line(upper, xMin)));
      ctx.closePath();
      ctx.fillStyle = k % 2 === 0 ? 'rgba(117, 109, 95, 0.10)' : 'rgba(117, 109, 95, 0.03)';
      ctx.fill();
      ctx.strokeStyle = 'rgba(117, 109, 95, 0.35)';
      ctx.lineWidth = devicePixelRatio;
      ctx.beginPath();
      ctx.moveTo(px(xMin), py(line(lower, xMin)));
      ctx.lineTo(px(xMax), py(line(lower, xMax)));
      ctx.stroke();
      // the class letter sits inside its strip at the right edge, or where the strip leaves
      // the bottom of the plot when it is below the range there
      const yMin = u.scales.y.min ?? 0;
      const mid = Math.sqrt(lower * upper);
      const nRight = xMax / 1.5;
      const nBottom = N0 * Math.sqrt(mid / (yMin * 3));
      const nLabel = line(mid, nRight) >= yMin * 3 ? nRight : nBottom;
      const y = py(line(mid, nLabel));
      const x = px(nLabel);
      if (nLabel >= xMin && nLabel <= xMax && y > u.bbox.top + 6 && y < u.bbox.top + u.bbox.height - 6) {
        ctx.fillStyle = theme.inkSoft;
        ctx.textAlign = 'center';
        ctx.fillText(cls, x, y);
      }
    });
    ctx.restore();
  };
}

/** Decades shown below the highest PSD value: the ISO classes span eight (A to H at one n). */
const DECADES_SHOWN = 8;

/** Displacement PSD of the road against spatial frequency, log-log, over the ISO 8608 class strips. */
export function RoadPsdChart({ psd }: { psd: PsdPreview }) {
  const theme = useChartTheme();
  const yRange = useRef<[number, number]>([1e-9, 1e-1]);
  const options = useMemo<ChartOptions>(
    () => ({
      height: 280,
      scales: { ...logLogScales(), y: { time: false, distr: 3, log: 10, range: () => yRange.current } },
      axes: [
        themedAxis(theme, { label: 'Spatial frequency', unit: 'cycle/m', log: true }),
        themedAxis(theme, { label: 'Displacement PSD', unit: 'm³', size: 64, log: true }),
      ],
      series: [
        { label: 'n', value: (_u, v) => (v == null ? '–' : `${formatTick(v)} cycle/m`) },
        themedSeries({ label: 'Road PSD', unit: 'm³', color: seriesColor(theme, 0), width: 1 }),
        themedSeries({ label: 'Fitted ISO line', unit: 'm³', color: seriesColor(theme, 1), width: 1.5, dash: [6, 4] }),
      ],
      hooks: { drawAxes: [drawIsoBands(theme)] },
    }),
    [theme],
  );
  const data = useMemo(() => {
    const range = logDecadeRange(psd.psd, DECADES_SHOWN);
    yRange.current = range;
    // below the shown range a line only leaves the plot; left out, it also keeps uPlot's log splits finite
    const shown = Array.from(psd.psd, (v) => (v >= range[0] ? v : null));
    const fit = psd.fit ? Array.from(psd.fit, (v) => (Number.isNaN(v) ? null : v)) : Array.from(psd.n, () => null);
    return [psd.n, shown, fit] as uPlot.AlignedData;
  }, [psd]);
  return <UChart options={options} data={data} label="Road displacement PSD against ISO 8608 classes" exportName="road-psd" />;
}
