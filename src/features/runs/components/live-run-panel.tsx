import { useEffect, useMemo, useRef, useState } from 'react';
import type uPlot from 'uplot';
import type { RoadInput } from '../../../../shared/schemas/road.ts';
import type { RunResult } from '../../../../shared/schemas/run.ts';
import type { SetupInput } from '../../../../shared/schemas/setup.ts';
import { roadLabel } from '../../../../shared/runs/road-label.ts';
import { thinColumns } from '../../../../shared/runs/thin-trace.ts';
import { linearX } from '../../../components/charts/axes.ts';
import { themedAxis, themedSeries } from '../../../components/charts/chart-theme.ts';
import { type ChartOptions, UChart, useChartTheme } from '../../../components/charts/uplot-chart.tsx';
import { Figure } from '../../../components/ui/figure.tsx';
import { Spinner } from '../../../components/ui/spinner.tsx';
import { formatQuantityText } from '../../../lib/format.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { simulate } from '../../../lib/simulate-client.ts';
import { LiveScheduler } from '../../../lib/live-scheduler.ts';
import { rideJudgement } from '../../../../shared/sim/metrics/rms-method.ts';
import { runWarnings } from '../model/warnings.ts';

export interface LiveRunPanelProps {
  /** The setup as it is being edited (may be momentarily invalid: the panel then says why). */
  setup: SetupInput;
  road: RoadInput;
  /** m/s. */
  speed: number;
  /** s; default 20. */
  duration?: number;
  /** Replaces the seed of an ISO 8608 road. */
  seed?: number;
  /** Leave out the panel's own "Live run" title when the page already gives one. */
  hideTitle?: boolean;
}

interface Shown {
  result: RunResult;
  time: Float64Array;
  travel: Float64Array;
  /** Edit → figures on screen, ms (the run plus drawing). */
  latencyMs: number;
  seq: number;
}

const LIVE_POINTS = 800;

interface LiveRequest {
  setup: SetupInput;
  road: RoadInput;
  speed: number;
  duration: number;
  seed?: number;
}

/**
 * Live mode: every change of setup, road or speed re-runs a short simulation in a worker
 * (leading edge at once, bursts debounced by 150 ms, a stale run cancelled) and shows the key
 * figures and a small travel chart. Spectra and responses are skipped to keep it quick.
 */
export function LiveRunPanel({ setup, road, speed, duration = 20, seed, hideTitle = false }: LiveRunPanelProps) {
  const theme = useChartTheme();
  const [shown, setShown] = useState<Shown | null>(null);
  const [pending, setPending] = useState(false);
  const [failure, setFailure] = useState<string | null>(null);
  const seq = useRef(0);
  const changedAt = useRef(0);

  const scheduler = useRef<LiveScheduler<LiveRequest> | null>(null);
  const latest = useRef<LiveRequest | null>(null);

  // Made in an effect (not during render) so a remount, as StrictMode does in development, gets a live scheduler.
  useEffect(() => {
    const s = new LiveScheduler<LiveRequest>({
      quietMs: 150,
      run: async (req, signal) => {
        const started = changedAt.current;
        setPending(true);
        const outcome = await simulate(req, { signal, spectra: false, response: false });
        if (signal.aborted) return;
        setPending(false);
        if (!outcome.ok) {
          if (!('cancelled' in outcome)) setFailure(outcome.reason);
          return;
        }
        setFailure(null);
        const thinned = thinColumns([outcome.trace.travel], outcome.trace.dt, LIVE_POINTS);
        setShown({ result: outcome.result, time: thinned.time, travel: thinned.columns[0], latencyMs: performance.now() - started, seq: ++seq.current });
      },
    });
    scheduler.current = s;
    if (latest.current) s.change(latest.current);
    return () => {
      s.dispose();
      scheduler.current = null;
    };
  }, []);

  const key = JSON.stringify([setup, road, speed, duration, seed]);
  useEffect(() => {
    changedAt.current = performance.now();
    latest.current = { setup, road, speed, duration, seed };
    scheduler.current?.change(latest.current);
    // `key` stands for the values: a new object with the same content is no change
  }, [key]);

  const units = useUnits();
  const options = useMemo(
    (): ChartOptions => ({
      height: 130,
      scales: { x: linearX },
      axes: [themedAxis(theme, { size: 28 }), themedAxis(theme, { label: 'Travel', unit: units.length.symbol, size: 52 })],
      series: [{ label: 's' }, themedSeries({ label: 'Travel', unit: units.length.symbol, color: theme.ink })],
      legend: { show: false },
    }),
    [theme, units.length],
  );
  const data = useMemo((): uPlot.AlignedData => (shown ? [shown.time, shown.travel.map(units.length.fromSI)] : [[], []]), [shown, units.length]);

  const m = shown?.result.metrics;
  const judged = shown ? rideJudgement(shown.result.road.kind, shown.result.metrics) : null;
  const warnings = m ? runWarnings(m, units.damperVelocity) : [];
  const strokeUsed = m ? Math.max(m.strokeUsedCompression ?? 0, m.strokeUsedExtension ?? 0) : 0;
  const stale = Boolean(failure) || pending;

  return (
    <section aria-label="Live run figures" className="rounded border border-rule bg-paper-raised p-3" data-live-figures data-run-seq={shown?.seq ?? 0} data-latency-ms={shown ? shown.latencyMs.toFixed(1) : undefined}>
      <header className="mb-2 flex items-baseline justify-between gap-2">
        {hideTitle ? <span /> : <h3 className="text-sm font-semibold">Live run</h3>}
        <span className="flex items-center gap-1.5 text-2xs text-ink-faint">
          {pending ? <Spinner label="Updating" /> : shown ? <span className="figures">updated in {Math.round(shown.latencyMs)} ms</span> : null}
        </span>
      </header>
      <p className="mb-2 text-xs text-ink-soft">
        {formatQuantityText(duration, 's')} on {roadLabel(road, seed)} at {formatQuantityText(speed, units.speed)}; re-runs as you edit.
      </p>
      {failure && (
        <p role="alert" className="mb-2 rounded-sm border border-danger/30 bg-danger-wash px-2 py-1 text-xs text-danger">
          {failure}
          {shown && <span className="block text-ink-soft">The figures below are from the last setup that ran.</span>}
        </p>
      )}
      {!shown && !failure && <p className="py-4 text-sm text-ink-faint">Running…</p>}
      {m && shown && (
        <div className={stale ? 'opacity-60 transition-opacity' : 'transition-opacity'}>
          <dl className="grid grid-cols-2 gap-x-4 gap-y-1 text-sm">
            {judged?.lead === 'event' ? (
              <LiveFigure name="mtvv" label="MTVV (1 s)" hue="comfort">
                {m.mtvv === undefined ? <span className="text-ink-faint">—</span> : <Figure value={m.mtvv} unit="mps2" label="MTVV" />}
              </LiveFigure>
            ) : (
              <LiveFigure name="aw" label="aw (Wk RMS)" hue="comfort">
                <Figure value={m.bodyAccelWkRms} unit="mps2" label="Wk-weighted RMS" />
              </LiveFigure>
            )}
            <LiveFigure name="vdv" label="VDV" hue="comfort">
              <Figure value={m.vdv} unit="mps175" label="VDV" />
            </LiveFigure>
            <LiveFigure name="loadRatio" label="Tyre load var." hue="grip">
              <Figure value={m.tyreLoadRatio} unit="percent" label="tyre load variation" />
            </LiveFigure>
            <LiveFigure name="liftOff" label="Lift-off" hue="grip" warn={m.liftOffFraction > 0}>
              <Figure value={m.liftOffFraction} unit="percent" label="lift-off share" />
            </LiveFigure>
            <LiveFigure name="stroke" label="Stroke used" warn={strokeUsed > 0.9}>
              {m.strokeUsedCompression === undefined ? <span className="text-ink-faint">—</span> : <Figure value={strokeUsed} unit="percent" label="stroke used" />}
            </LiveFigure>
            <LiveFigure name="velRms" label="Piston vel. RMS">
              <Figure value={m.damperVelocityRms} unit={units.damperVelocity} label="piston velocity RMS" />
            </LiveFigure>
            <LiveFigure name="bodyHz" label="Body mode" wide>
              <Figure value={shown.result.modal.body.naturalHz} unit="Hz" label="body frequency" /> <span className="text-xs text-ink-faint">ζ</span> <Figure value={shown.result.modal.body.dampingRatio} label="body damping ratio" />
            </LiveFigure>
            <LiveFigure name="wheelHz" label="Wheel hop" wide>
              <Figure value={shown.result.modal.wheel.naturalHz} unit="Hz" label="wheel-hop frequency" /> <span className="text-xs text-ink-faint">ζ</span> <Figure value={shown.result.modal.wheel.dampingRatio} label="wheel-hop damping ratio" />
            </LiveFigure>
          </dl>
          <p className={`mt-1 text-xs ${judged?.verdict ? 'text-comfort' : 'text-ink-soft'}`}>{judged?.verdict ? judged.verdict.bands.join(' / ') : judged?.why}</p>
          {warnings.length > 0 && (
            <ul className="mt-1 text-xs text-signal-ink">
              {warnings.map((w) => (
                <li key={w.key}>▲ {w.text}</li>
              ))}
            </ul>
          )}
          <UChart options={options} data={data} label="Travel, live" className="mt-1" />
        </div>
      )}
    </section>
  );
}

function LiveFigure({ name, label, hue, warn, wide, children }: { name: string; label: string; hue?: 'comfort' | 'grip'; warn?: boolean; wide?: boolean; children: React.ReactNode }) {
  return (
    <div className={`flex items-baseline justify-between gap-2 border-b border-rule/60 py-0.5 ${wide ? 'col-span-2' : ''}`} data-figure={name}>
      <dt className={`text-xs ${hue === 'comfort' ? 'text-comfort' : hue === 'grip' ? 'text-grip' : 'text-ink-soft'}`}>{label}</dt>
      <dd className={`whitespace-nowrap ${warn ? 'font-semibold [&_*]:!text-signal-ink' : ''}`}>{children}</dd>
    </div>
  );
}
