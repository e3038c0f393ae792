import type uPlot from 'uplot';

type Paint = uPlot.Series['stroke'] | uPlot.Series.Points['fill'];

function paint(u: uPlot, i: number, value: Paint): string | undefined {
  const v = typeof value === 'function' ? (value as (u: uPlot, i: number) => unknown)(u, i) : value;
  return typeof v === 'string' ? v : undefined;
}

/**
 * uPlot draws every legend marker as a square in the line's colour and fill, so series drawn
 * only as dots (no line) that share a colour but differ in fill (a filled dot, a hollow ring,
 * a ring around a coloured dot) all got the same square. Markers of dot-only series take the
 * dot's own outline and fill instead; line series keep uPlot's look.
 */
export function withDotMarkers<T extends Pick<uPlot.Options, 'series' | 'legend'>>(options: T): T {
  const dotOnly = (s: uPlot.Series | undefined) => !!s && s.points?.show === true && (s.width === 0 || typeof s.paths === 'function');
  // read from the options: once uPlot has the series, `points.show` is a function
  const dots = new Set(options.series.flatMap((s, i) => (i > 0 && dotOnly(s) ? [i] : [])));
  if (dots.size === 0 || options.legend?.markers?.stroke || options.legend?.markers?.fill) return options;
  return {
    ...options,
    legend: {
      ...options.legend,
      markers: {
        ...options.legend?.markers,
        stroke: (u, i) => {
          const s = u.series[i];
          return (dots.has(i) ? paint(u, i, s?.points?.stroke) : undefined) ?? paint(u, i, s?.stroke) ?? 'currentColor';
        },
        fill: (u, i) => {
          const s = u.series[i];
          return (dots.has(i) ? paint(u, i, s?.points?.fill) : paint(u, i, s?.fill)) ?? 'transparent';
        },
      },
    },
  };
}
