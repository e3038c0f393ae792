import { useState } from 'react';
import type { RunSummary } from '../../../../../shared/schemas/run-record.ts';
import type { SetupSummary } from '../../../../../shared/schemas/setup-record.ts';
import { Button } from '../../../../components/ui/button.tsx';
import { Field, Select } from '../../../../components/ui/field.tsx';
import { type CompareEntry, entryKey, MAX_COMPARED } from '../../model/compare.ts';
import { Swatch } from './swatch.tsx';

export interface ComparePickerProps {
  entries: CompareEntry[];
  onChange: (entries: CompareEntry[]) => void;
  setups: SetupSummary[];
  runs: RunSummary[];
}

/** The runs in the comparison, each with its colour, and controls to add a setup or a saved run. */
export function ComparePicker({ entries, onChange, setups, runs }: ComparePickerProps) {
  const [setupId, setSetupId] = useState('');
  const [revision, setRevision] = useState('');
  const [runId, setRunId] = useState('');
  const full = entries.length >= MAX_COMPARED;
  const chosenSetup = setups.find((s) => s.id === (setupId || setups[0]?.id));
  const add = (e: CompareEntry) => {
    if (full || entries.some((x) => entryKey(x) === entryKey(e))) return;
    onChange([...entries, e]);
  };
  const nameOf = (e: CompareEntry) => {
    if (e.kind === 'setup') return `${setups.find((s) => s.id === e.setupId)?.name ?? 'Setup'} r${e.revision}`;
    const run = runs.find((r) => r.id === e.runId);
    return run ? `${run.name} (saved)` : 'Saved run';
  };

  return (
    <div className="rounded border border-rule bg-paper-raised p-3">
      <ol aria-label="Compared" className="mb-3 flex flex-wrap gap-2">
        {entries.map((e, i) => (
          <li key={entryKey(e)} className="flex items-center gap-2 rounded border border-rule-strong bg-paper px-2 py-1 text-sm">
            <Swatch slot={i} />
            <span>{nameOf(e)}</span>
            <button type="button" className="text-ink-faint hover:text-danger" aria-label={`Remove ${nameOf(e)}`} onClick={() => onChange(entries.filter((x) => x !== e))}>
              ×
            </button>
          </li>
        ))}
        {entries.length === 0 && <li className="text-sm text-ink-faint">Add two to four setups or saved runs. The first is the reference the others are measured against.</li>}
      </ol>
      <div className="flex flex-wrap items-end gap-x-5 gap-y-3">
        <div className="flex items-end gap-2">
          <Field label="Setup" className="w-64">
            <Select
              value={chosenSetup?.id ?? ''}
              onChange={(e) => {
                setSetupId(e.target.value);
                setRevision('');
              }}
            >
              {setups.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.name}
                </option>
              ))}
            </Select>
          </Field>
          <Field label="Revision" className="w-36">
            <Select value={revision || String(chosenSetup?.latestRevision ?? '')} onChange={(e) => setRevision(e.target.value)}>
              {chosenSetup &&
                Array.from({ length: chosenSetup.latestRevision }, (_, i) => chosenSetup.latestRevision - i).map((n) => (
                  <option key={n} value={n}>
                    r{n}
                    {n === chosenSetup.latestRevision ? ' (latest)' : ''}
                  </option>
                ))}
            </Select>
          </Field>
          <Button disabled={full || !chosenSetup} onClick={() => chosenSetup && add({ kind: 'setup', setupId: chosenSetup.id, revision: Number(revision || chosenSetup.latestRevision) })}>
            Add setup
          </Button>
        </div>
        <div className="flex items-end gap-2">
          <Field label="Saved run" className="w-72">
            <Select value={runId || runs[0]?.id || ''} onChange={(e) => setRunId(e.target.value)} disabled={runs.length === 0}>
              {runs.length === 0 && <option value="">No saved runs</option>}
              {runs.map((r) => (
                <option key={r.id} value={r.id}>
                  {r.name}
                </option>
              ))}
            </Select>
          </Field>
          <Button disabled={full || runs.length === 0} onClick={() => add({ kind: 'saved', runId: runId || runs[0].id })}>
            Add saved run
          </Button>
        </div>
      </div>
    </div>
  );
}
