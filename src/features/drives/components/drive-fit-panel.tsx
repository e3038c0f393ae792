import { useQuery } from '@tanstack/react-query';
import { useEffect, useRef, useState } from 'react';
import type { DriveFitOutcome } from '../../../../shared/drive/fit-drive.ts';
import { fitParameters } from '../../../../shared/drive/fit-parameters.ts';
import { parameterProblem } from '../../../../shared/drive/fit-drive.ts';
import type { DriveChannel, DriveDetail } from '../../../../shared/schemas/drive.ts';
import { driveChannels } from '../../../../shared/schemas/drive.ts';
import type { FitParameterKey } from '../../../../shared/schemas/drive-fit.ts';
import type { Setup } from '../../../../shared/schemas/setup.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input, Select } from '../../../components/ui/field.tsx';
import { Notice } from '../../../components/ui/notice.tsx';
import { Loading } from '../../../components/ui/spinner.tsx';
import { isApiError } from '../../../lib/api-client.ts';
import { formatDateTime, formatSig } from '../../../lib/format.ts';
import { roadQueryOptions, roadsQueryOptions } from '../../../lib/queries/roads.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { useApplyDriveFit } from '../api/apply-drive-fit.ts';
import { useDrive } from '../api/get-drive.ts';
import { useDrives } from '../api/get-drives.ts';
import { channelDisplay } from '../model/channel-display.ts';
import { runDriveFit } from '../model/fit-client.ts';
import { DriveCoherenceChart, DriveSpectrumChart, DriveTraceChart } from './drive-charts.tsx';
import { DriveUpload } from './drive-upload.tsx';
import { FitResults } from './fit-results.tsx';

export interface DriveFitPanelProps {
  workspaceId: string;
  setupId: string;
  /** The latest revision's document: the fit starts from it and saves next to it. */
  setup: Setup;
  latestRevision: number;
  readOnly?: boolean;
  draftHasChanges?: boolean;
  onApplied?: (revisionNumber: number) => void;
}

/**
 * Drives of one setup: upload (engineers), the drives kept, and the fit of the chosen one — the
 * model driven over the drive's road with chosen parameters moved until its signals match the
 * measured ones, in a worker of this browser.
 */
export function DriveFitPanel(props: DriveFitPanelProps) {
  const { workspaceId, setupId, readOnly } = props;
  const drives = useDrives(workspaceId, setupId);
  const [selected, setSelected] = useState<string | null>(null);
  const [uploading, setUploading] = useState(false);
  const current = selected ?? drives.data?.drives[0]?.id ?? null;
  const detail = useDrive(workspaceId, setupId, current);
  const speed = useUnits().speed;

  return (
    <div className="grid min-w-0 grid-cols-[minmax(0,1fr)] gap-4" data-testid="drive-fit-panel">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div className="min-w-0">
          {drives.isPending ? (
            <Loading what="drives" />
          ) : drives.isError ? (
            <Notice tone="danger">{drives.error.message}</Notice>
          ) : drives.data.drives.length === 0 ? (
            <p className="text-sm text-ink-faint">No measured drives for this setup yet.</p>
          ) : (
            <ul className="grid gap-1 text-sm" aria-label="Measured drives">
              {drives.data.drives.map((d) => (
                <li key={d.id}>
                  <button
                    type="button"
                    onClick={() => setSelected(d.id)}
                    aria-current={d.id === current || undefined}
                    className={`rounded px-2 py-1 text-left hover:bg-accent-wash ${d.id === current ? 'bg-accent-wash font-medium text-accent-strong' : ''}`}
                  >
                    {d.filename}
                    <span className="ml-2 text-xs text-ink-faint">
                      {d.summary.duration.toFixed(1)} s at {formatSig(speed.fromSI(d.summary.meanSpeed), 3)} {speed.symbol} · {d.uploadedBy.name}, {formatDateTime(d.createdAt)}
                      {d.note && ` · ${d.note}`}
                      {d.producedRevision && ` · made revision ${d.producedRevision.number}`}
                    </span>
                  </button>
                </li>
              ))}
            </ul>
          )}
        </div>
        {!readOnly && !uploading && (
          <Button size="sm" variant="secondary" onClick={() => setUploading(true)}>
            Upload a drive log
          </Button>
        )}
      </div>
      {!readOnly && uploading && (
        <div className="rounded border border-rule bg-paper-raised p-3">
          <DriveUpload
            workspaceId={workspaceId}
            setupId={setupId}
            onUploaded={(d) => {
              setSelected(d.id);
              setUploading(false);
            }}
          />
          <Button size="sm" variant="quiet" className="mt-2" onClick={() => setUploading(false)}>
            Close
          </Button>
        </div>
      )}
      {current && (detail.isPending ? <Loading what="the drive" /> : detail.isError ? <Notice tone="danger">{detail.error.message}</Notice> : <DriveFit key={detail.data.id} drive={detail.data} {...props} />)}
    </div>
  );
}

const defaultParameters: FitParameterKey[] = ['unsprungMass', 'springRate', 'compressionScale', 'reboundScale'];
const ESTIMATED = 'estimated';

function DriveFit({ workspaceId, setupId, setup, latestRevision, readOnly, draftHasChanges, onApplied, drive }: DriveFitPanelProps & { drive: DriveDetail }) {
  const units = useUnits();
  const roads = useQuery(roadsQueryOptions(workspaceId));
  const measuredRoads = (roads.data?.roads ?? []).filter((r) => r.kind === 'measured');
  const present = driveChannels.filter((c) => drive.data.channels[c]);
  const [roadId, setRoadId] = useState<string>('');
  const chosenRoad = roadId || measuredRoads[0]?.id || ESTIMATED;
  const road = useQuery(roadQueryOptions(workspaceId, chosenRoad === ESTIMATED ? undefined : chosenRoad));
  const [offset, setOffset] = useState('0');
  const [settle, setSettle] = useState('1');
  const [params, setParams] = useState<FitParameterKey[]>(defaultParameters);
  const [channels, setChannels] = useState<DriveChannel[]>(present);
  const [result, setResult] = useState<DriveFitOutcome | null>(null);
  const [running, setRunning] = useState(false);
  const [shownChannel, setShownChannel] = useState<DriveChannel>(present[0]);
  const [message, setMessage] = useState('');
  const [saved, setSaved] = useState<number | null>(null);
  const abort = useRef<AbortController | null>(null);
  const apply = useApplyDriveFit(workspaceId, setupId);
  useEffect(() => () => abort.current?.abort(), []);

  const roadKind = chosenRoad === ESTIMATED ? 'estimated' : 'profile';
  const problem = params.length === 0 ? 'Choose at least one parameter to fit.' : parameterProblem(params, roadKind)?.replace(/^parameters: /, '');
  const offsetValue = Number(offset);
  const settleValue = Number(settle);
  const inputsOk = !problem && channels.length > 0 && Number.isFinite(offsetValue) && offsetValue >= 0 && Number.isFinite(settleValue) && settleValue >= 0 && (roadKind === 'estimated' || road.data?.definition.kind === 'measured');

  const run = async () => {
    abort.current?.abort();
    const controller = new AbortController();
    abort.current = controller;
    setRunning(true);
    setSaved(null);
    const definition = road.data?.definition;
    const outcome = await runDriveFit(
      {
        setup,
        data: drive.data,
        road: roadKind === 'estimated' || definition?.kind !== 'measured' ? { kind: 'estimated' } : { kind: 'profile', road: definition, offset: offsetValue },
        parameters: params,
        channels,
        settle: settleValue,
      },
      controller.signal,
    );
    if (abort.current !== controller) return;
    setRunning(false);
    if ('cancelled' in outcome) return;
    setResult(outcome);
    if (outcome.ok) {
      setShownChannel(outcome.channels[0].channel);
      setMessage(`${outcome.parameters.map((p) => p.label.toLowerCase()).join(', ')} fitted`);
    }
  };
  const cancel = () => {
    abort.current?.abort();
    abort.current = null;
    setRunning(false);
  };

  const fitted = result?.ok ? result : null;
  const shownFit = fitted?.channels.find((c) => c.channel === shownChannel) ?? fitted?.channels[0];
  const serverError = isApiError(apply.error) ? apply.error : null;
  const toggle = <T,>(list: T[], item: T, on: boolean) => (on ? [...list, item] : list.filter((x) => x !== item));

  return (
    <div className="grid min-w-0 grid-cols-[minmax(0,1fr)] gap-4">
      <p className="text-xs text-ink-soft">
        {drive.summary.samples} samples at {formatSig(drive.summary.rate, 3)} Hz over {drive.summary.duration.toFixed(1)} s, {drive.summary.distance.toFixed(0)} m driven. Columns:{' '}
        {drive.summary.columns.map((c) => `${c.header}`).join(', ')}.
        {drive.summary.warnings.length > 0 && ` ${drive.summary.warnings.map((w) => (w.line ? `line ${w.line}${w.column ? `, column ${w.column}` : ''}: ` : '') + w.message).join('; ')}.`}
      </p>

      <section aria-label="Fit settings" className="grid gap-3 rounded border border-rule bg-paper-raised p-3">
        <h3 className="text-sm font-semibold text-ink">Fit the model to this drive</h3>
        <div className="grid gap-3 md:grid-cols-[minmax(0,2fr)_minmax(0,1fr)_minmax(0,1fr)]">
          <Field label="Road under the drive" hint={roadKind === 'estimated' ? 'From the two accelerations and this revision\u2019s masses and tyre rate; nothing below 0.5 Hz.' : 'A measured profile from the road library, driven at the logged speed.'}>
            <Select value={chosenRoad} onChange={(e) => setRoadId(e.target.value)}>
              {measuredRoads.map((r) => (
                <option key={r.id} value={r.id}>
                  {r.name}
                </option>
              ))}
              <option value={ESTIMATED}>Estimated from the wheel signals</option>
            </Select>
          </Field>
          <Field label={`Drive starts into the profile [m]`}>
            <Input className="figures" inputMode="decimal" value={offset} disabled={roadKind === 'estimated'} onChange={(e) => setOffset(e.target.value)} />
          </Field>
          <Field label="Left out while the model settles [s]">
            <Input className="figures" inputMode="decimal" value={settle} onChange={(e) => setSettle(e.target.value)} />
          </Field>
        </div>
        <fieldset className="grid gap-1">
          <legend className="mb-1 text-xs font-medium text-ink-soft">Parameters to identify (the others stay as in revision {latestRevision})</legend>
          <div className="flex flex-wrap gap-x-5 gap-y-1 text-sm">
            {fitParameters.map((p) => (
              <label key={p.key} className="flex items-center gap-2">
                <input type="checkbox" checked={params.includes(p.key)} onChange={(e) => setParams((l) => toggle(l, p.key, e.target.checked))} />
                {p.label}
                <span className="text-xs text-ink-faint">{p.unit === 'N/m' ? `${formatSig(units.rate.fromSI(p.read(setup)), 4)} ${units.rate.symbol}` : p.unit === 'kg' ? `${formatSig(p.read(setup), 4)} kg` : 'from 1×'}</span>
              </label>
            ))}
          </div>
        </fieldset>
        <fieldset className="grid gap-1">
          <legend className="mb-1 text-xs font-medium text-ink-soft">Signals compared</legend>
          <div className="flex flex-wrap gap-x-5 gap-y-1 text-sm">
            {present.map((c) => (
              <label key={c} className="flex items-center gap-2">
                <input type="checkbox" checked={channels.includes(c)} onChange={(e) => setChannels((l) => toggle(l, c, e.target.checked))} />
                {channelDisplay(c, units).label}
              </label>
            ))}
          </div>
        </fieldset>
        {problem && <p className="text-xs text-danger">{problem}</p>}
        <div className="flex flex-wrap items-center gap-3">
          <Button variant="primary" disabled={!inputsOk || running} busy={running} onClick={() => void run()}>
            {running ? 'Fitting…' : 'Run the fit'}
          </Button>
          {running && (
            <Button variant="quiet" onClick={cancel}>
              Stop
            </Button>
          )}
          <span className="text-2xs text-ink-faint">Least squares (Levenberg–Marquardt) in this browser; a 20 s drive takes a few seconds.</span>
        </div>
      </section>

      {result && !result.ok && <Notice tone="danger" title="The fit could not be made">{result.reason}</Notice>}
      {fitted && shownFit && (
        <section aria-label="Fit result" className="grid min-w-0 grid-cols-[minmax(0,1fr)] gap-4">
          <FitResults fit={fitted} />
          <div className="flex flex-wrap items-center gap-2 text-sm" role="group" aria-label="Signal shown">
            {fitted.channels.map((c) => (
              <Button key={c.channel} size="sm" variant={c.channel === shownFit.channel ? 'primary' : 'secondary'} aria-pressed={c.channel === shownFit.channel} onClick={() => setShownChannel(c.channel)}>
                {channelDisplay(c.channel, units).label}
              </Button>
            ))}
          </div>
          <DriveTraceChart fit={shownFit} settle={settleValue} />
          <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
            <DriveSpectrumChart fit={shownFit} />
            <DriveCoherenceChart fit={shownFit} />
          </div>
          {!readOnly && (
            <div className="grid gap-2 rounded border border-rule bg-paper-raised px-3 py-2" role="group" aria-label="Save the fitted corner">
              <p className="text-xs text-ink-soft">
                Saves revision {latestRevision} with the fitted values as revision {latestRevision + 1}; its message names this drive. Fitted values guide tuning; they do not certify a vehicle.
                {draftHasChanges && <strong className="font-semibold text-signal-ink"> Your unsaved edits on the bench are not part of it.</strong>}
                {!fitted.verdict.good && <strong className="font-semibold text-danger"> A poor fit cannot be saved.</strong>}
              </p>
              <div className="flex flex-wrap items-end gap-3">
                <Field label="What changed (revision message)" className="min-w-72 flex-1">
                  <Input value={message} onChange={(e) => setMessage(e.target.value)} maxLength={400} />
                </Field>
                <Button
                  variant="primary"
                  disabled={!fitted.verdict.good || apply.isPending}
                  busy={apply.isPending}
                  onClick={() =>
                    apply.mutate(
                      { driveId: drive.id, input: { setup: fitted.setup, message, basedOn: latestRevision } },
                      {
                        onSuccess: (r) => {
                          setSaved(r.revision.number);
                          onApplied?.(r.revision.number);
                        },
                      },
                    )
                  }
                >
                  Save the fitted corner as revision {latestRevision + 1}
                </Button>
              </div>
            </div>
          )}
          {serverError && <FormError message={serverError.message} />}
          {saved !== null && <Notice tone="ok">Saved as revision {saved}, citing {drive.filename}.</Notice>}
        </section>
      )}
    </div>
  );
}
