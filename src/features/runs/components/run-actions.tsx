import { useState } from 'react';
import type { SaveRunInputIn } from '../../../../shared/schemas/run-record.ts';
import type { RunRequestInput } from '../../../../shared/schemas/run.ts';
import { roadLabel } from '../../../../shared/runs/road-label.ts';
import { toStoredSpectra, toStoredTraces } from '../../../../shared/runs/stored-run.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input, Select } from '../../../components/ui/field.tsx';
import { useToast } from '../../../components/ui/toast.tsx';
import { formatQuantityText } from '../../../lib/format.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { useSaveRun } from '../api/save-run.ts';
import { downloadText } from '../../../lib/download.ts';
import { exportFileName, exportStem, type ExportSubject } from '../../../lib/export-name.ts';
import { figuresCsv, tracesCsv } from '../model/export-csv.ts';
import { fullRateTrace, rerunNote, TRACE_RATES } from '../model/full-rate-trace.ts';
import type { RunView } from '../model/run-view.ts';

/** "Pipit front r3 · class C, seed 7 · 60 km/h · 20 s". */
export function runTitle(view: RunView, revisionNumber?: number): string {
  const r = view.result;
  return [
    `${view.setup.name}${revisionNumber ? ` r${revisionNumber}` : ''}`,
    roadLabel(view.road, view.seed),
    formatQuantityText(r.speed, 'kmph'),
    formatQuantityText(r.duration, 's'),
  ].join(' · ');
}

/** What a run's file names and image captions name: setup, revision, road, speed. */
export function runSubject(view: RunView, revision?: number): ExportSubject {
  return { setupName: view.setup.name, revision, road: view.road, speed: view.result.speed };
}

/**
 * Figures CSV, and traces CSV at a chosen rate: every sample, evenly spaced (a saved run is run
 * again from its stored inputs in a worker, since only thinned traces are stored).
 */
export function ExportButtons({ view, request, revision }: { view: RunView; request: RunRequestInput; revision?: number }) {
  const chosen = useUnits();
  const [rate, setRate] = useState<number>(() => (view.full ? Math.round(1 / view.full.dt) : view.result.outputRate));
  const [busy, setBusy] = useState(false);
  const toast = useToast();
  const stem = exportStem(runSubject(view, revision));
  const about = runTitle(view, revision);
  const rates = [...new Set<number>([view.result.outputRate, ...TRACE_RATES])].sort((a, b) => a - b);

  const exportTraces = async () => {
    setBusy(true);
    try {
      const got = await fullRateTrace(view, request, rate);
      if (got.ok) downloadText(tracesCsv(got.trace, about, got.rerun ? [rerunNote(view.result, got.rerun)] : []), exportFileName(stem, `traces ${rate}Hz`, 'csv'));
      else toast.show(`The traces could not be computed again: ${got.reason}`, 'danger');
    } finally {
      setBusy(false);
    }
  };

  return (
    <>
      <Button size="sm" onClick={() => downloadText(figuresCsv([{ name: about, result: view.result }], chosen), exportFileName(stem, 'figures', 'csv'))}>
        Figures CSV
      </Button>
      <span className="inline-flex items-center gap-1">
        <Button size="sm" busy={busy} onClick={() => void exportTraces()} title={view.full ? undefined : 'Runs the stored inputs again in this browser to get every sample'}>
          Traces CSV
        </Button>
        <label className="sr-only" htmlFor="trace-rate">
          Trace sample rate
        </label>
        <Select id="trace-rate" className="h-8 w-28 text-xs" value={rate} onChange={(e) => setRate(Number(e.target.value))}>
          {rates.map((r) => (
            <option key={r} value={r}>
              {r} samples/s
            </option>
          ))}
        </Select>
      </span>
    </>
  );
}

export interface SaveTarget {
  setupId: string;
  revisionNumber: number;
  roadId: string | null;
}

/** Save a fresh run to the workspace: its inputs, figures and thinned traces. */
export function SaveRunForm({ workspaceId, view, target, onSaved }: { workspaceId: string; view: RunView; target: SaveTarget; onSaved: (runId: string) => void }) {
  const [name, setName] = useState(() => runTitle(view, target.revisionNumber));
  const [error, setError] = useState('');
  const save = useSaveRun(workspaceId);
  const toast = useToast();
  const full = view.full;
  if (!full) return null;

  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    setError('');
    const r = view.result;
    const input: SaveRunInputIn = {
      name: name.trim(),
      setupId: target.setupId,
      revisionNumber: target.revisionNumber,
      setup: view.setup,
      roadId: target.roadId,
      // a library measured profile can be long: the server reads it from the library instead
      road: target.roadId && view.road.kind === 'measured' ? undefined : view.road,
      speed: r.speed,
      duration: r.duration,
      seed: view.seed,
      result: r,
      traces: toStoredTraces(full, r.settleTime),
      spectra: view.spectra ? toStoredSpectra(view.spectra) : undefined,
    };
    save.mutate(input, {
      onSuccess: (saved) => {
        toast.show(`Saved “${saved.name}”.`, 'ok');
        onSaved(saved.id);
      },
      onError: (err) => setError(err.message),
    });
  };

  return (
    <form onSubmit={submit} aria-label="Save this run" className="flex flex-wrap items-end gap-2">
      <Field label="Save as" className="min-w-[18rem] flex-1">
        <Input value={name} onChange={(e) => setName(e.target.value)} maxLength={120} />
      </Field>
      <Button type="submit" variant="primary" size="md" busy={save.isPending} disabled={!name.trim()}>
        Save run
      </Button>
      <FormError message={error} />
    </form>
  );
}
