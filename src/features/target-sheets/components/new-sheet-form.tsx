import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { defaultReferenceSpeeds, defaultTolerance } from '../../../../shared/target-sheet/reference-speeds.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input, Select } from '../../../components/ui/field.tsx';
import { latestRevisionsQueryOptions } from '../../../lib/queries/revisions.ts';
import { setupsQueryOptions } from '../../../lib/queries/setups.ts';
import { siFromShown } from '../../../lib/units/unit-table.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { useCreateSheet } from '../api/create-sheet.ts';

/** Reads "0.025, 0.05 0.1" as speeds in m/s; undefined when the text is not a list of numbers. */
export function parseSpeeds(text: string): number[] | undefined {
  const parts = text.split(/[\s,;]+/).filter(Boolean);
  const values = parts.map(Number);
  return parts.length > 0 && values.every((v) => Number.isFinite(v) && v > 0) ? [...new Set(values)].sort((a, b) => a - b) : undefined;
}

/**
 * Drafts a sheet from one setup revision: pick the setup, its revision (latest first), and
 * optionally the reference speeds and the band every point starts with.
 */
export function NewSheetForm({ workspaceId, onCreated }: { workspaceId: string; onCreated: (sheetId: string) => void }) {
  const setups = useQuery(setupsQueryOptions(workspaceId));
  const [setupId, setSetupId] = useState('');
  const revisions = useQuery(latestRevisionsQueryOptions(workspaceId, setupId || undefined));
  const [revision, setRevision] = useState('');
  const vu = useUnits().damperVelocity;
  // the list as typed, with the unit it was typed in; re-expressed when the person changes unit
  const [speedsTyped, setSpeedsTyped] = useState<{ text: string; unit: typeof vu } | null>(null);
  const shownList = (si: readonly number[]) => si.map((v) => String(Number(vu.fromSI(v).toPrecision(4)))).join(', ');
  const typedSI = speedsTyped && parseSpeeds(speedsTyped.text)?.map((v) => siFromShown(speedsTyped.unit, v));
  const speeds = speedsTyped && (speedsTyped.unit === vu || !typedSI) ? speedsTyped.text : shownList(typedSI || defaultReferenceSpeeds);
  const setSpeeds = (text: string) => setSpeedsTyped({ text, unit: vu });
  const [tolPct, setTolPct] = useState(String(defaultTolerance.tolPct));
  const [floorN, setFloorN] = useState(String(defaultTolerance.floorN));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const create = useCreateSheet(workspaceId);

  const latest = revisions.data?.revisions[0]?.number;
  const chosenRevision = revision ? Number(revision) : latest;

  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    const problems: Record<string, string> = {};
    const list = parseSpeeds(speeds)?.map((v) => siFromShown(vu, v));
    if (!setupId) problems.setupId = 'Choose a setup';
    if (!chosenRevision) problems.revision = 'Choose a revision';
    if (!list) problems.speeds = `Positive speeds in ${vu.symbol}, separated by commas`;
    if (!(Number(tolPct) >= 0 && Number(tolPct) <= 100) || tolPct.trim() === '') problems.tolPct = '0 to 100 %';
    if (!(Number(floorN) >= 0) || floorN.trim() === '') problems.floorN = '0 N or more';
    setErrors(problems);
    if (Object.keys(problems).length) return;
    create.mutate(
      { setupId, revision: chosenRevision!, speeds: list, tolPct: Number(tolPct), floorN: Number(floorN) },
      { onSuccess: (d) => onCreated(d.sheet.id) },
    );
  };

  return (
    <form onSubmit={submit} noValidate aria-label="Draft a target sheet" className="space-y-3 rounded border border-rule bg-paper-raised px-4 py-3">
      <div className="grid gap-3 md:grid-cols-[2fr_1fr]">
        <Field label="Setup" error={errors.setupId}>
          <Select
            value={setupId}
            onChange={(e) => {
              setSetupId(e.target.value);
              setRevision('');
            }}
          >
            <option value="">{setups.isPending ? 'Loading setups…' : 'Choose a setup'}</option>
            {setups.data?.setups.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Revision" error={errors.revision}>
          <Select value={revision} onChange={(e) => setRevision(e.target.value)} disabled={!setupId}>
            {!setupId && <option value="">—</option>}
            {revisions.data?.revisions.map((r, i) => (
              <option key={r.number} value={i === 0 ? '' : r.number}>
                {r.number}
                {i === 0 ? ' (latest)' : ''} — {r.message || 'no message'}
              </option>
            ))}
          </Select>
        </Field>
      </div>
      <div className="grid gap-3 md:grid-cols-[2fr_1fr_1fr]">
        <Field label={`Reference speeds [${vu.symbol}]`} error={errors.speeds} hint="Forces are read off the damper curve at these speeds.">
          <Input value={speeds} onChange={(e) => setSpeeds(e.target.value)} className="figures" />
        </Field>
        <Field label="Tolerance ± [%]" error={errors.tolPct}>
          <Input type="number" step="any" value={tolPct} onChange={(e) => setTolPct(e.target.value)} className="figures" />
        </Field>
        <Field label="Floor [N]" error={errors.floorN} hint="Smallest half-width of a band.">
          <Input type="number" step="any" value={floorN} onChange={(e) => setFloorN(e.target.value)} className="figures" />
        </Field>
      </div>
      <FormError message={create.error?.message} />
      <Button type="submit" variant="primary" busy={create.isPending}>
        Draft sheet
      </Button>
    </form>
  );
}
