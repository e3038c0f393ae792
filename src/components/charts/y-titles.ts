import type uPlot from 'uplot';

/** Room above the plot for the y-axis titles, in CSS pixels. */
const TITLE_ROW = 20;
/** Smallest gap between y ticks: short stacked charts still get three or more labelled ticks. */
const Y_TICK_SPACE = 18;

/**
 * uPlot writes a y-axis title along the axis, rotated, and cuts it where the plot is shorter than
 * the title ("Body acceleration [m/s" on a 150 px lane). Here each y title is taken off the axis
 * and written level above it instead, on the canvas (so a saved PNG keeps it): the left axis's
 * title from the left edge, a right axis's title ending at the right edge. Its length then only
 * meets the chart's width. y axes also get a denser tick spacing than uPlot's 30 px.
 */
export function withLevelYTitles<T extends Pick<uPlot.Options, 'axes' | 'hooks' | 'padding'>>(options: T): T {
  const axes = options.axes;
  if (!axes || axes.length < 2) return options;
  const titles: { text: string; font: string; color: string; right: boolean }[] = [];
  const nextAxes = axes.map((axis, i) => {
    const vertical = i > 0 && axis.side !== 0 && axis.side !== 2;
    if (!vertical) return axis;
    const out: uPlot.Axis = { space: Y_TICK_SPACE, ...axis };
    if (typeof axis.label === 'string' && axis.label) {
      titles.push({
        text: axis.label,
        font: typeof axis.labelFont === 'string' ? axis.labelFont : '12px sans-serif',
        color: typeof axis.stroke === 'string' ? axis.stroke : '#4a443b',
        right: axis.side === 1,
      });
      out.label = undefined;
      out.labelSize = 0;
      out.labelGap = 0;
    }
    return out;
  });
  if (titles.length === 0) return { ...options, axes: nextAxes };
  const draw = (u: uPlot) => {
    const { ctx } = u;
    const ratio = devicePixelRatio;
    ctx.save();
    ctx.textBaseline = 'middle';
    for (const title of titles) {
      ctx.font = title.font.replace(/(\d+(?:\.\d+)?)px/, (_m, px: string) => `${Math.round(Number(px) * ratio)}px`);
      ctx.fillStyle = title.color;
      ctx.textAlign = title.right ? 'right' : 'left';
      ctx.fillText(title.text, title.right ? ctx.canvas.width - 2 * ratio : 2 * ratio, (TITLE_ROW / 2) * ratio);
    }
    ctx.restore();
  };
  const padding = options.padding ?? [null, null, null, null];
  return {
    ...options,
    axes: nextAxes,
    padding: [TITLE_ROW + 6, padding[1], padding[2], padding[3]],
    hooks: { ...options.hooks, draw: [...(options.hooks?.draw ?? []), draw] },
  };
}
