import { useState } from 'react';
import type { SaveRunInputIn } from '../../../../shared/schemas/run-record.ts';
import { roadLabel } from '../../../../shared/runs/road-label.ts';
import { toStoredSpectra, toStoredTraces } from '../../../../shared/runs/stored-run.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input } from '../../../components/ui/field.tsx';
import { useToast } from '../../../components/ui/toast.tsx';
import { formatQuantityText } from '../../../lib/format.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { useSaveRun } from '../api/save-run.ts';
import { downloadText } from '../../../lib/download.ts';
import { fileStem, figuresCsv, tracesCsv } from '../model/export-csv.ts';
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

export function ExportButtons({ view, name }: { view: RunView; name: string }) {
  const chosen = useUnits();
  return (
    <>
      <Button size="sm" onClick={() => downloadText(figuresCsv([{ name, result: view.result }], chosen), `${fileStem(name)}-figures.csv`)}>
        Figures CSV
      </Button>
      <Button size="sm" onClick={() => downloadText(tracesCsv(view), `${fileStem(name)}-traces.csv`)}>
        Traces CSV
      </Button>
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
