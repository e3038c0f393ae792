import { useMemo, useState } from 'react';
import { fitDamperCurves } from '../../../../shared/dyno/fit-curve.ts';
import type { DynoDirection } from '../../../../shared/schemas/dyno.ts';
import type { DamperCurve } from '../../../../shared/schemas/setup.ts';
import type { DynoFileDetail } from '../../../../shared/schemas/dyno-file.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input, Select } from '../../../components/ui/field.tsx';
import { Notice } from '../../../components/ui/notice.tsx';
import { isApiError } from '../../../lib/api-client.ts';
import { useApplyDynoFit } from '../api/apply-dyno-fit.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { knotsText, readKnots, suggestKnots } from '../model/knots.ts';
import { DynoChart } from './dyno-chart.tsx';
import { GasInReadings } from './gas-in-readings.tsx';
import { ResidualsTable } from './residuals-table.tsx';

/**
 * Fit of one kept file: the speeds to fit at, which directions, the residual of every measured
 * point, and "save as a new revision" (the server fits again with the same code and links the
 * file to the revision it made).
 */
export function FitPanel({
  workspaceId,
  setupId,
  file,
  latestRevision,
  readOnly,
  draftHasChanges,
  onApplied,
}: {
  workspaceId: string;
  setupId: string;
  file: DynoFileDetail;
  latestRevision: number;
  readOnly?: boolean;
  draftHasChanges?: boolean;
  onApplied?: (revisionNumber: number) => void;
}) {
  const apply = useApplyDynoFit(workspaceId, setupId);
  const peaks = file.summary.peaks;
  const vu = useUnits().damperVelocity;
  const [knots, setKnots] = useState(() => knotsText(suggestKnots(peaks), vu));
  const [knotsUnit, setKnotsUnit] = useState(vu);
  if (knotsUnit !== vu) {
    // another unit chosen: the list is re-expressed, never reinterpreted
    const before = readKnots(knots, knotsUnit);
    setKnotsUnit(vu);
    if (before.ok) setKnots(knotsText(before.knots, vu));
  }
  const [chosen, setChosen] = useState<Record<DynoDirection, boolean>>({ compression: peaks.compression.length > 0, rebound: peaks.rebound.length > 0 });
  const [weighting, setWeighting] = useState<'absolute' | 'relative'>('absolute');
  const [message, setMessage] = useState(`Fitted to ${file.filename}`);
  const [saved, setSaved] = useState<number | null>(null);
  const parsedKnots = readKnots(knots, knotsUnit);
  const fit = useMemo(() => (parsedKnots.ok ? fitDamperCurves(peaks, parsedKnots.knots, { weighting }) : null), [peaks, knots, weighting]);
  const fitted = {
    compression: chosen.compression && fit?.compression.ok ? (fit.compression.table as unknown as DamperCurve) : undefined,
    rebound: chosen.rebound && fit?.rebound.ok ? (fit.rebound.table as unknown as DamperCurve) : undefined,
  };
  const directions = (['compression', 'rebound'] as const).filter((d) => chosen[d]);
  const canApply = !readOnly && parsedKnots.ok && directions.length > 0 && directions.every((d) => fit?.[d].ok) && message.trim().length > 0;
  const serverError = isApiError(apply.error) ? apply.error : null;

  const save = () => {
    if (!parsedKnots.ok) return;
    apply.mutate(
      { fileId: file.id, input: { knots: parsedKnots.knots, directions: [...directions], message: message.trim(), weighting, basedOn: latestRevision } },
      {
        onSuccess: (r) => {
          setSaved(r.revision.number);
          onApplied?.(r.revision.number);
        },
      },
    );
  };

  return (
    <div className="grid gap-3">
      <GasInReadings file={file} />
      <p className="text-2xs text-ink-faint">
        Dots: measured {file.loop ? 'peak force of each stroke' : 'points'}; lines: the fitted tables
        {file.loop ? '; thin dark line: the record itself, force against velocity sample by sample (the loop)' : ''}.
      </p>
      <DynoChart peaks={peaks} loop={file.loop} fitted={fitted} />
      <div className="grid gap-3 sm:grid-cols-[minmax(0,1fr)_12rem]">
        <Field label={`Fit at these piston speeds [${vu.symbol}]`} error={parsedKnots.ok ? undefined : parsedKnots.message} hint="A table point at each; force never falls with speed.">
          <Input className="figures" value={knots} onChange={(e) => setKnots(e.target.value)} />
        </Field>
        <Field label="Weighting">
          <Select value={weighting} onChange={(e) => setWeighting(e.target.value as typeof weighting)}>
            <option value="absolute">every point in N</option>
            <option value="relative">every point in %</option>
          </Select>
        </Field>
      </div>
      <div className="flex flex-wrap gap-4 text-sm">
        {(['compression', 'rebound'] as const).map((d) => (
          <label key={d} className="flex items-center gap-2">
            <input type="checkbox" checked={chosen[d]} disabled={peaks[d].length === 0} onChange={(e) => setChosen((c) => ({ ...c, [d]: e.target.checked }))} />
            use the {d} fit
          </label>
        ))}
      </div>
      {fit && (
        <div className="grid gap-4 lg:grid-cols-2">
          {(['compression', 'rebound'] as const)
            .filter((d) => peaks[d].length > 0)
            .map((d) => (
              <ResidualsTable key={d} direction={d} fit={fit[d]} />
            ))}
        </div>
      )}
      {!readOnly && (
        <div className="grid gap-2 rounded border border-rule bg-paper-raised px-3 py-2" role="group" aria-label="Save the fitted curve">
          <p className="text-xs text-ink-soft">
            Saves revision {latestRevision} with its {directions.length ? directions.join(' and ') : 'chosen'} curve{directions.length > 1 ? 's' : ''} replaced by this fit, as revision {latestRevision + 1}.
            {draftHasChanges && <strong className="font-semibold text-signal-ink"> Your unsaved edits on the bench are not part of it.</strong>}
          </p>
          <div className="flex flex-wrap items-end gap-3">
            <Field label="What changed (revision message)" className="min-w-72 flex-1">
              <Input value={message} onChange={(e) => setMessage(e.target.value)} maxLength={500} />
            </Field>
            <Button variant="primary" disabled={!canApply} busy={apply.isPending} onClick={save}>
              Save the fitted dyno curve as revision {latestRevision + 1}
            </Button>
          </div>
        </div>
      )}
      {serverError && <FormError message={serverError.message} />}
      {saved !== null && (
        <Notice tone="ok">
          Saved as revision {saved}, with the {directions.join(' and ')} curve{directions.length > 1 ? 's' : ''} from this file.
        </Notice>
      )}
    </div>
  );
}
