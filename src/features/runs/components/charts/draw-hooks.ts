import uPlot from 'uplot';

/**
 * Reference lines drawn on the plot area (stop clearances, static load, band edges): a thin
 * dashed line in a colour, at a value of the x or y scale.
 */
export interface RefLine {
  axis: 'x' | 'y';
  value: number;
  color: string;
  /** y scale key when not 'y'. */
  scale?: string;
  dash?: number[];
}

export function refLinesHook(lines: RefLine[]): (u: uPlot) => void {
  return (u) => {
    const { ctx } = u;
    const { left, top, width, height } = u.bbox;
    ctx.save();
    ctx.lineWidth = Math.max(1, devicePixelRatio);
    for (const line of lines) {
      const scale = line.axis === 'x' ? 'x' : (line.scale ?? 'y');
      const pos = u.valToPos(line.value, scale, true);
      if (!Number.isFinite(pos)) continue;
      ctx.strokeStyle = line.color;
      ctx.setLineDash((line.dash ?? [4, 3]).map((d) => d * devicePixelRatio));
      ctx.beginPath();
      if (line.axis === 'x') {
        if (pos < left || pos > left + width) continue;
        ctx.moveTo(pos, top);
        ctx.lineTo(pos, top + height);
      } else {
        if (pos < top || pos > top + height) continue;
        ctx.moveTo(left, pos);
        ctx.lineTo(left + width, pos);
      }
      ctx.stroke();
    }
    ctx.restore();
  };
}

/** Bars for histograms (x at the bin centre), a little narrower than their bin. */
export function barPaths(): uPlot.Series.PathBuilder {
  return uPlot.paths.bars!({ size: [0.92, Infinity], align: 0 });
}

/** Values ≤ 0 become gaps, so a log axis never sees them. */
export function positiveOrNull(x: ArrayLike<number>): (number | null)[] {
  return Array.from(x, (v) => (v > 0 && Number.isFinite(v) ? v : null));
}
