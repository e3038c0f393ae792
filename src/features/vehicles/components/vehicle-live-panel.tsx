import { useEffect, useRef, useState } from 'react';
import type { RoadInput } from '../../../../shared/schemas/road.ts';
import type { Setup, SetupInput } from '../../../../shared/schemas/setup.ts';
import type { VehicleRunResult } from '../../../../shared/schemas/vehicle-run.ts';
import type { VehicleSetupInput } from '../../../../shared/schemas/vehicle-setup.ts';
import { Figure } from '../../../components/ui/figure.tsx';
import { Input, Select } from '../../../components/ui/field.tsx';
import { Spinner } from '../../../components/ui/spinner.tsx';
import { formatQuantityText } from '../../../lib/format.ts';
import { simulateVehicle } from '../../../lib/simulate-client.ts';
import { siFromShown } from '../../../lib/units/unit-table.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { LiveScheduler } from '../../../lib/live-scheduler.ts';
import { vehicleCheckLines } from '../model/vehicle-words.ts';

/** Roads the panel offers: the demo class C road, a car-park bump and long waves (all invented). */
const ROADS: Array<{ key: string; label: string; road: RoadInput }> = [
  { key: 'iso', label: 'ISO 8608 class C, seed 7', road: { kind: 'iso8608', name: 'Class C, seed 7', class: 'C', seed: 7 } },
  { key: 'bump', label: 'Car-park bump, 6 cm', road: { kind: 'bump', name: 'Car-park bump', height: 0.06, length: 0.9, at: 25 } },
  { key: 'waves', label: 'Long waves, 15 m', road: { kind: 'sine', name: 'Long waves, 15 m', amplitude: 0.015, wavelength: 15 } },
];
const DURATION = 20;

interface Body {
  wheelbase: number;
  radius: number;
  frontRebound: number;
  rearRebound: number;
  speed: number;
  roadKey: string;
}

const scaleRebound = (s: Setup, k: number): SetupInput => ({ ...s, damper: { ...s.damper, rebound: s.damper.rebound.map(([v, f]) => [v, f * k] as [number, number]) } });

interface Shown {
  result: VehicleRunResult;
  latencyMs: number;
  seq: number;
}

/**
 * The whole vehicle in the pitch plane, run live in a worker (as the corner bench runs a
 * corner): both corners' latest revisions under one body, with the body's wheelbase and pitch
 * inertia and each end's rebound scale editable here. Nothing here is saved.
 */
export function VehicleLivePanel({ front, rear }: { front: Setup; rear: Setup }) {
  const units = useUnits();
  const [body, setBody] = useState<Body>({ wheelbase: 2.55, radius: 1.15, frontRebound: 1, rearRebound: 1, speed: 20, roadKey: 'iso' });
  const [texts, setTexts] = useState<Record<string, string>>({});
  const [shown, setShown] = useState<Shown | null>(null);
  const [pending, setPending] = useState(false);
  const [failure, setFailure] = useState<string | null>(null);
  const changedAt = useRef(0);
  const seq = useRef(0);
  const scheduler = useRef<LiveScheduler<{ vehicle: VehicleSetupInput; road: RoadInput; speed: number }> | null>(null);
  const latest = useRef<{ vehicle: VehicleSetupInput; road: RoadInput; speed: number } | null>(null);

  useEffect(() => {
    const s = new LiveScheduler<{ vehicle: VehicleSetupInput; road: RoadInput; speed: number }>({
      quietMs: 150,
      run: async (req, signal) => {
        const started = changedAt.current;
        setPending(true);
        const outcome = await simulateVehicle({ ...req, duration: DURATION }, { signal });
        if (signal.aborted) return;
        setPending(false);
        if (!outcome.ok) {
          if (!('cancelled' in outcome)) setFailure(outcome.reason);
          return;
        }
        setFailure(null);
        setShown({ result: outcome.result, latencyMs: performance.now() - started, seq: ++seq.current });
      },
    });
    scheduler.current = s;
    if (latest.current) s.change(latest.current);
    return () => {
      s.dispose();
      scheduler.current = null;
    };
  }, []);

  const road = ROADS.find((r) => r.key === body.roadKey)!.road;
  const key = JSON.stringify([front, rear, body]);
  useEffect(() => {
    changedAt.current = performance.now();
    latest.current = {
      vehicle: {
        name: 'Live vehicle',
        wheelbase: body.wheelbase,
        pitchRadiusOfGyration: body.radius,
        front: scaleRebound(front, body.frontRebound),
        rear: scaleRebound(rear, body.rearRebound),
      },
      road,
      speed: body.speed,
    };
    scheduler.current?.change(latest.current);
    // `key` stands for the values
  }, [key]);

  const numberField = (name: keyof Body, label: string, unitText: string, toShown: (si: number) => number, toSI: (shown: number) => number, min: number) => (
    <label className="flex w-28 flex-col gap-0.5 text-xs text-ink-soft">
      <span className="whitespace-nowrap">
        {label}
        {unitText && <span className="text-ink-faint">, {unitText}</span>}
      </span>
      <Input
        inputMode="decimal"
        name={name}
        value={texts[name] ?? String(Number(toShown(body[name] as number).toPrecision(4)))}
        onChange={(e) => {
          setTexts((t) => ({ ...t, [name]: e.target.value }));
          const n = Number(e.target.value.replace(',', '.'));
          if (e.target.value.trim() !== '' && Number.isFinite(n) && n > min) setBody((b) => ({ ...b, [name]: toSI(n) }));
        }}
      />
    </label>
  );

  const r = shown?.result;
  const speedText = (v: number) => formatQuantityText(v, units.speed);
  const lines = r ? vehicleCheckLines(r.linear, r.speed, speedText) : [];
  const stale = Boolean(failure) || pending;

  return (
    <section
      aria-label="Whole vehicle, live"
      className="mt-4 rounded border border-rule bg-paper-raised px-4 py-3"
      data-vehicle-live
      data-run-seq={shown?.seq ?? 0}
      data-latency-ms={shown ? shown.latencyMs.toFixed(1) : undefined}
    >
      <header className="flex items-baseline justify-between gap-2">
        <h2 className="text-2xs font-semibold tracking-wider text-ink-faint uppercase">Whole vehicle, heave and pitch</h2>
        <span className="flex items-center gap-1.5 text-2xs text-ink-faint">
          {pending ? <Spinner label="Updating" /> : shown ? <span className="figures">updated in {Math.round(shown.latencyMs)} ms</span> : null}
        </span>
      </header>
      <p className="mt-1 text-xs text-ink-soft">
        Both corners' latest revisions under one body, each axle two identical corners; the rear meets the road a wheelbase after the front.{' '}
        {formatQuantityText(DURATION, 's')} on {ROADS.find((x) => x.key === body.roadKey)!.label}, re-run as you edit. Nothing here is saved.
      </p>
      <div className="mt-2 flex flex-wrap items-end gap-3">
        <label className="flex w-56 flex-col gap-0.5 text-xs text-ink-soft">
          Road
          <Select name="road" value={body.roadKey} onChange={(e) => setBody((b) => ({ ...b, roadKey: e.target.value }))}>
            {ROADS.map((x) => (
              <option key={x.key} value={x.key}>
                {x.label}
              </option>
            ))}
          </Select>
        </label>
        {numberField('speed', 'Speed', units.speed.symbol, units.speed.fromSI, (n) => siFromShown(units.speed, n), 0)}
        {numberField('wheelbase', 'Wheelbase', 'm', (x) => x, (x) => x, 0.5)}
        {numberField('radius', 'Pitch radius k', 'm', (x) => x, (x) => x, 0)}
        {numberField('frontRebound', 'Front rebound', '×', (x) => x, (x) => x, 0)}
        {numberField('rearRebound', 'Rear rebound', '×', (x) => x, (x) => x, 0)}
      </div>
      {failure && (
        <p role="alert" className="mt-2 rounded-sm border border-danger/30 bg-danger-wash px-2 py-1 text-xs text-danger">
          {failure}
          {shown && <span className="block text-ink-soft">The figures below are from the last vehicle that ran.</span>}
        </p>
      )}
      {!r && !failure && <p className="py-4 text-sm text-ink-faint">Running…</p>}
      {r && (
        <div className={`mt-3 grid gap-4 lg:grid-cols-[minmax(0,1.25fr)_minmax(0,1.1fr)_minmax(0,0.9fr)] ${stale ? 'opacity-60 transition-opacity' : 'transition-opacity'}`}>
          <div>
            <h3 className="text-xs font-semibold text-ink-soft">Modes</h3>
            <table className="mt-1 w-full text-sm" aria-label="Vehicle modes">
              <thead>
                <tr className="text-2xs text-ink-faint">
                  <th className="text-left font-normal" />
                  <th className="text-right font-normal">natural</th>
                  <th className="text-right font-normal">ζ</th>
                  <th className="text-right font-normal">still point</th>
                </tr>
              </thead>
              <tbody>
                {(
                  [
                    ['heave', 'Heave'],
                    ['pitch', 'Pitch'],
                    ['frontHop', 'Front wheel hop'],
                    ['rearHop', 'Rear wheel hop'],
                  ] as const
                ).map(([k, label]) => {
                  const m = r.linear.modes[k];
                  return (
                    <tr key={k} className="border-b border-rule/50 last:border-0" data-mode={k}>
                      <th scope="row" className="py-0.5 pr-2 text-left font-normal text-ink-soft">
                        {label}
                      </th>
                      <td className="text-right">
                        <Figure value={m.naturalHz} unit="Hz" label={`${label} frequency`} />
                      </td>
                      <td className="text-right">
                        <Figure value={m.dampingRatio} digits={2} label={`${label} damping ratio`} />
                      </td>
                      <td className="pl-2 text-right text-xs whitespace-nowrap text-ink-soft">{m.nodeBehindFrontAxle === null ? '—' : stillPoint(m.nodeBehindFrontAxle, r.linear.geometry.wheelbase)}</td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
            <p className="mt-1 text-2xs text-ink-faint">
              Dynamic index k²/(a·b) <Figure value={r.linear.dynamicIndex} digits={2} label="dynamic index" /> (1: each end moves on its own). Body{' '}
              <Figure value={r.linear.geometry.mass} unit="kg" label="body mass" />, CG <Figure value={r.linear.geometry.a} unit="m" label="CG behind the front axle" /> behind the
              front axle.
            </p>
          </div>
          <div>
            <h3 className="text-xs font-semibold text-ink-soft">Flat ride (rules of thumb, common practice)</h3>
            <ul className="mt-1 space-y-1 text-xs leading-relaxed" aria-label="Flat-ride checks">
              {lines.map((l) => (
                <li key={l.key} data-check={l.key} data-met={l.met} className={l.met ? 'text-ink-soft' : 'text-signal-ink'}>
                  <span aria-hidden>{l.met ? '○ ' : '▲ '}</span>
                  {l.text}
                </li>
              ))}
            </ul>
          </div>
          <div>
            <h3 className="text-xs font-semibold text-ink-soft">Seats and axles</h3>
            <dl className="mt-1 grid grid-cols-[1fr_auto] gap-x-3 text-sm">
              {r.figures.seats.map((s) => (
                <div key={s.name} className="contents" data-seat={s.name}>
                  <dt className="text-xs text-comfort">{s.name}, total value</dt>
                  <dd className="text-right">
                    <Figure value={s.pointTotal} unit="mps2" label={`${s.name} point vibration total value`} />
                  </dd>
                  <dt className="pl-2 text-2xs text-ink-faint">vertical, Wk</dt>
                  <dd className="text-right text-xs">
                    <Figure value={s.verticalWkRms} unit="mps2" label={`${s.name} Wk-weighted vertical`} />
                  </dd>
                  <dd className="col-span-2 pb-1 pl-2 text-2xs text-comfort">{s.comfort.bands.join(' / ')}</dd>
                </div>
              ))}
              <dt className="text-xs text-comfort">Pitch, We RMS</dt>
              <dd className="figures text-right text-xs">{r.figures.pitchWeRms.toPrecision(3)} rad/s²</dd>
              {(['front', 'rear'] as const).map((end) => (
                <div key={end} className="contents" data-axle={end}>
                  <dt className="text-xs text-grip">{end === 'front' ? 'Front' : 'Rear'} tyre load var.</dt>
                  <dd className="text-right">
                    <Figure value={r.figures[end].tyreLoadRatio} unit="percent" label={`${end} tyre load variation`} />
                  </dd>
                  <dt className="pl-2 text-2xs text-ink-faint">lift-off · travel RMS</dt>
                  <dd className="text-right text-xs">
                    <Figure value={r.figures[end].liftOffFraction} unit="percent" label={`${end} lift-off`} />{' '}
                    <Figure value={r.figures[end].travelRms} unit={units.length} label={`${end} travel RMS`} />
                  </dd>
                </div>
              ))}
            </dl>
          </div>
        </div>
      )}
    </section>
  );
}

/** Where a body mode stands still, in words. */
function stillPoint(behindFront: number, wheelbase: number): string {
  if (behindFront < 0) return `${(-behindFront).toFixed(2)} m ahead of the front axle`;
  if (behindFront > wheelbase) return `${(behindFront - wheelbase).toFixed(2)} m behind the rear axle`;
  return `${behindFront.toFixed(2)} m behind the front axle`;
}
