import { useState, type FormEvent } from 'react';
import { readGasDeclaration } from '../../../../shared/dyno/gas-declaration.ts';
import { summariseDyno } from '../../../../shared/dyno-upload/summarise-dyno.ts';
import type { DynoParseOptions, ForceUnit, SignConvention, VelocityUnit, DisplacementUnit, TimeUnit } from '../../../../shared/schemas/dyno.ts';
import { DYNO_MAX_BYTES, type DynoFileItem, type DynoUploadFields } from '../../../../shared/schemas/dyno-file.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, Input, Select } from '../../../components/ui/field.tsx';
import { Notice } from '../../../components/ui/notice.tsx';
import { isApiError } from '../../../lib/api-client.ts';
import { formatSig } from '../../../lib/format.ts';
import { useUploadDynoFile } from '../api/upload-dyno-file.ts';
import { headerWords } from './gas-in-readings.tsx';

const layoutWords: Record<string, string> = {
  'direction-column': 'peak points with a direction column',
  'force-per-direction': 'peak points, one force column per direction',
  signed: 'peak points with signed velocity and force',
  'time-series': 'a raw record (time, displacement, force)',
};
const sourceWords = { header: 'from the header', option: 'as chosen here', default: 'not stated in the file' } as const;

interface Choices {
  velocityUnit: '' | VelocityUnit;
  forceUnit: '' | ForceUnit;
  displacementUnit: '' | DisplacementUnit;
  timeUnit: '' | TimeUnit;
  motionSign: SignConvention;
  forceSign: SignConvention;
  /** null until the engineer types one: then the file's header and the setup decide (see `autoGas`). */
  gasForce: string | null;
}

const initialChoices: Choices = { velocityUnit: '', forceUnit: '', displacementUnit: '', timeUnit: '', motionSign: 'compression-positive', forceSign: 'compression-positive', gasForce: null };

function optionsOf(c: Choices, autoGas: number): Partial<DynoParseOptions> {
  // A field emptied by hand means "nothing to take out"; untouched, the header's default applies.
  const gas = c.gasForce === null ? autoGas : c.gasForce.trim() === '' ? 0 : Number(c.gasForce);
  return {
    ...(c.velocityUnit ? { velocityUnit: c.velocityUnit } : {}),
    ...(c.forceUnit ? { forceUnit: c.forceUnit } : {}),
    ...(c.displacementUnit ? { displacementUnit: c.displacementUnit } : {}),
    ...(c.timeUnit ? { timeUnit: c.timeUnit } : {}),
    motionSign: c.motionSign,
    forceSign: c.forceSign,
    ...((c.gasForce !== null || autoGas > 0) && Number.isFinite(gas) && gas >= 0 ? { gasForce: gas } : {}),
  };
}

/**
 * Choosing and uploading a dyno CSV. The file is read in the browser with the same reader the
 * server uses, so the layout, the units (and where each came from) and any problem by line show
 * before anything is sent. A unit the file does not state is asked for; a sign that looks
 * reversed is pointed out. The server reads it again and keeps nothing from a refused file.
 */
export function UploadPanel({ workspaceId, setupId, gasForceHint, onUploaded }: { workspaceId: string; setupId: string; gasForceHint?: number; onUploaded: (file: DynoFileItem) => void }) {
  const upload = useUploadDynoFile(workspaceId, setupId);
  const [file, setFile] = useState<File | null>(null);
  const [text, setText] = useState<string | null>(null);
  const [c, setC] = useState<Choices>(initialChoices);
  // The file's own header decides the default: readings that include the gas force get the
  // setup's static gas force taken out, so the fit does not carry it as an offset.
  const declaration = text === null ? null : readGasDeclaration(text);
  const autoGas = declaration?.says === 'included' && gasForceHint !== undefined ? Math.round(gasForceHint * 10) / 10 : 0;
  const read = text === null ? null : summariseDyno(text, optionsOf(c, autoGas));
  const gasTaken = optionsOf(c, autoGas).gasForce ?? 0;
  const tooBig = file !== null && file.size > DYNO_MAX_BYTES;
  const set = <K extends keyof Choices>(key: K, value: Choices[K]) => setC((prev) => ({ ...prev, [key]: value }));

  const choose = async (f: File | undefined) => {
    setFile(f ?? null);
    setText(f && f.size <= DYNO_MAX_BYTES ? await f.text() : null);
    upload.reset();
  };

  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (!file) return;
    const o = optionsOf(c, autoGas);
    const fields: DynoUploadFields = { ...o };
    upload.mutate({ file, fields }, { onSuccess: (item) => (onUploaded(item), setFile(null), setText(null)) });
  };

  const units = read?.ok ? read.summary.units : null;
  const unstated = units ? (Object.entries(units) as [string, { unit: string; source: keyof typeof sourceWords } | undefined][]).filter(([, u]) => u?.source === 'default').map(([k]) => k) : [];
  const signWarnings = read?.ok ? (read.summary.series?.warnings ?? []).filter((w) => /sign|helps the motion|rebound/.test(w)) : [];
  const serverError = isApiError(upload.error) ? upload.error : null;

  return (
    <form onSubmit={submit} className="grid gap-3" aria-label="Upload a dyno file" noValidate>
      <Field label="Dyno file (CSV)" hint="Peak points per speed, or a raw record of time, displacement and force. Up to 2 MB.">
        <Input type="file" accept=".csv,.txt,text/csv" onChange={(e) => void choose(e.target.files?.[0])} className="pt-1" />
      </Field>
      {tooBig && <Notice tone="danger">The file is larger than 2 MB; thin the record or split it.</Notice>}

      {read && !read.ok && (
        <Notice tone="danger" title="This file cannot be used as it is">
          <ul className="mt-1 list-disc pl-5" aria-label="Problems in the file">
            {read.errors.map((e, i) => (
              <li key={i}>
                {e.line !== undefined && <span className="figures font-semibold">line {e.line}: </span>}
                {e.message}
              </li>
            ))}
          </ul>
        </Notice>
      )}

      {read?.ok && (
        <Notice tone="ok" title={`Read as ${layoutWords[read.summary.layout]}`}>
          {read.summary.rows} rows; {read.summary.peaks.compression.length} compression and {read.summary.peaks.rebound.length} rebound points
          {read.summary.series && `, from ${read.summary.series.halfCycles} strokes over ${formatSig(read.summary.series.duration, 3)} s (peak ${formatSig(read.summary.series.peakSpeed, 3)} m/s)`}.
          <span className="mt-1 block text-xs">
            {Object.entries(read.summary.units)
              .filter(([, u]) => u)
              .map(([k, u]) => `${k} in ${u!.unit} (${sourceWords[u!.source]})`)
              .join(' · ')}
          </span>
        </Notice>
      )}
      {read?.ok && (
        <p data-testid="upload-gas-choice" className={`rounded border px-3 py-1.5 text-sm ${declaration?.says === 'included' && gasTaken === 0 ? 'border-signal/60 bg-signal-wash' : 'border-rule bg-paper-raised'}`}>
          <strong className="font-semibold">
            Gas force to take out: <span className="figures">{formatSig(gasTaken, 3)}</span> N
          </strong>{' '}
          — {headerWords(declaration)}
          {c.gasForce === null && declaration?.says === 'included' && gasForceHint !== undefined ? ', so the setup’s static gas force is taken out' : ''}
          {c.gasForce !== null ? ' (your choice below)' : ''}. Change it under “Units, signs and gas force”.
        </p>
      )}
      {unstated.length > 0 && (
        <Notice tone="signal">The file does not state the unit of {unstated.join(', ')}; the reading above assumes SI. Choose the unit below if that is wrong.</Notice>
      )}
      {signWarnings.map((w) => (
        <Notice key={w} tone="signal">
          {w}. Check the sign conventions below.
        </Notice>
      ))}
      {read?.ok && read.summary.warnings.filter((w) => !/names no unit/.test(w.message)).length > 0 && (
        <ul className="text-xs text-ink-soft" aria-label="Warnings from the file">
          {read.summary.warnings
            .filter((w) => !/names no unit/.test(w.message))
            .map((w, i) => (
              // a reading against its direction's sign is what a person must look at: it stands out
              <li key={i} className={/wrong sign/.test(w.message) ? 'font-medium text-signal-ink' : undefined}>
                {file?.name}
                {w.line !== undefined && `, line ${w.line}`}: {w.message}
              </li>
            ))}
        </ul>
      )}

      <details open={unstated.length > 0 || signWarnings.length > 0 || declaration !== null} className="rounded border border-rule px-3 py-2">
        <summary className="cursor-pointer text-sm text-ink-soft">Units, signs and gas force</summary>
        <div className="mt-2 grid gap-3 sm:grid-cols-3">
          <Field label="Velocity unit">
            <Select value={c.velocityUnit} onChange={(e) => set('velocityUnit', e.target.value as Choices['velocityUnit'])}>
              <option value="">as the header says (else m/s)</option>
              <option value="m/s">m/s</option>
              <option value="mm/s">mm/s</option>
              <option value="in/s">in/s</option>
            </Select>
          </Field>
          <Field label="Force unit">
            <Select value={c.forceUnit} onChange={(e) => set('forceUnit', e.target.value as Choices['forceUnit'])}>
              <option value="">as the header says (else N)</option>
              <option value="N">N</option>
              <option value="kN">kN</option>
              <option value="lbf">lbf</option>
            </Select>
          </Field>
          <Field label="Gas force in the readings [N]" hint={gasForceHint !== undefined ? `the setup's static gas force is ${formatSig(gasForceHint, 3)} N` : 'leave empty when already removed'}>
            <Input inputMode="decimal" className="figures text-right" value={c.gasForce ?? (autoGas ? String(autoGas) : '')} onChange={(e) => set('gasForce', e.target.value)} />
          </Field>
          <Field label="Displacement unit">
            <Select value={c.displacementUnit} onChange={(e) => set('displacementUnit', e.target.value as Choices['displacementUnit'])}>
              <option value="">as the header says (else m)</option>
              <option value="m">m</option>
              <option value="mm">mm</option>
              <option value="in">in</option>
            </Select>
          </Field>
          <Field label="Time unit">
            <Select value={c.timeUnit} onChange={(e) => set('timeUnit', e.target.value as Choices['timeUnit'])}>
              <option value="">as the header says (else s)</option>
              <option value="s">s</option>
              <option value="ms">ms</option>
            </Select>
          </Field>
          <span />
          <Field label="Motion sign in the file">
            <Select value={c.motionSign} onChange={(e) => set('motionSign', e.target.value as SignConvention)}>
              <option value="compression-positive">compression (rod in) positive</option>
              <option value="extension-positive">extension (rod out) positive</option>
            </Select>
          </Field>
          <Field label="Force sign in the file">
            <Select value={c.forceSign} onChange={(e) => set('forceSign', e.target.value as SignConvention)}>
              <option value="compression-positive">resisting compression positive</option>
              <option value="extension-positive">resisting extension positive</option>
            </Select>
          </Field>
        </div>
      </details>

      {serverError && (
        <Notice tone="danger" title={serverError.message}>
          {serverError.fields.length > 1 && (
            <ul className="mt-1 list-disc pl-5">
              {serverError.fields.map((f, i) => (
                <li key={i}>
                  <span className="figures">{f.path}</span>: {f.message}
                </li>
              ))}
            </ul>
          )}
        </Notice>
      )}
      <div>
        <Button type="submit" variant="primary" busy={upload.isPending} disabled={!file || tooBig}>
          Upload and keep
        </Button>
      </div>
    </form>
  );
}
