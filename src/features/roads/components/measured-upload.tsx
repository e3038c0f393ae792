import { useState, type FormEvent } from 'react';
import { RoadName, type ElevationUnit } from '../../../../shared/schemas/road-record.ts';
import { parseMeasuredCsv } from '../../../../shared/sim/roads/measured-csv.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, FormError, Input, Select } from '../../../components/ui/field.tsx';
import { Notice } from '../../../components/ui/notice.tsx';
import { isApiError } from '../../../lib/api-client.ts';
import { formatSig } from '../../../lib/format.ts';
import { useUploadMeasuredRoad } from '../api/upload-measured-road.ts';

type Check = { ok: true; points: number; length: number; spacing: number; distanceUnit: string; elevationUnit: string } | { ok: false; reason: string; needsUnit: boolean };

/** The file read in the browser with the server's own reader, so units and problems show before the upload. */
function check(text: string, distanceUnit?: ElevationUnit, elevationUnit?: ElevationUnit): Check {
  const out = parseMeasuredCsv(text, { distanceUnit, elevationUnit, maxRows: 500_000 });
  if (!out.ok) return { ok: false, reason: out.reason, needsUnit: /elevation unit/.test(out.reason) };
  const p = out.profile;
  return { ok: true, points: p.points.length, length: p.length, spacing: p.medianSpacing, distanceUnit: p.distanceUnit, elevationUnit: p.elevationUnit };
}

/**
 * Upload of a measured profile (CSV of distance and elevation). Units are read from the header
 * (`distance [m], elevation [mm]`); when the header has none the form asks. The server reads
 * the file again and refuses it with the line at fault; nothing is saved from a refused file.
 */
export function MeasuredUpload({ workspaceId, onSaved }: { workspaceId: string; onSaved: (roadId: string) => void }) {
  const upload = useUploadMeasuredRoad(workspaceId);
  const [file, setFile] = useState<File | null>(null);
  const [text, setText] = useState<string | null>(null);
  const [name, setName] = useState('');
  const [distanceUnit, setDistanceUnit] = useState<'' | ElevationUnit>('');
  const [elevationUnit, setElevationUnit] = useState<'' | ElevationUnit>('');
  const [detrend, setDetrend] = useState<'linear' | 'mean' | 'none'>('linear');
  const result = text === null ? null : check(text, distanceUnit || undefined, elevationUnit || undefined);
  const nameOk = RoadName.safeParse(name);

  const choose = async (f: File | undefined) => {
    setFile(f ?? null);
    setText(f ? await f.text() : null);
    if (f && !name) setName(f.name.replace(/\.[^.]+$/, '').replace(/[-_]+/g, ' '));
    upload.reset();
  };

  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (!file || !nameOk.success) return;
    upload.mutate(
      { file, fields: { name: nameOk.data, distanceUnit: distanceUnit || undefined, elevationUnit: elevationUnit || undefined, detrend, spacing: undefined } },
      { onSuccess: (road) => onSaved(road.id) },
    );
  };

  const serverError = upload.error && isApiError(upload.error) ? upload.error : null;
  return (
    <form onSubmit={submit} className="grid gap-3" aria-label="Upload a measured profile" noValidate>
      <Field label="Profile file (CSV: distance, elevation)" hint="Header such as: distance [m], elevation [mm]. Comma, semicolon or tab.">
        <Input type="file" accept=".csv,.txt,text/csv" onChange={(e) => void choose(e.target.files?.[0])} className="pt-1" />
      </Field>
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Name" error={file && !nameOk.success ? nameOk.error.issues[0]?.message : undefined}>
          <Input value={name} onChange={(e) => setName(e.target.value)} maxLength={120} />
        </Field>
        <Field label="Remove before use">
          <Select value={detrend} onChange={(e) => setDetrend(e.target.value as typeof detrend)}>
            <option value="linear">a straight line (grade)</option>
            <option value="mean">the mean</option>
            <option value="none">nothing</option>
          </Select>
        </Field>
        <Field label="Distance unit" hint="as the header says, unless chosen here">
          <Select value={distanceUnit} onChange={(e) => setDistanceUnit(e.target.value as typeof distanceUnit)}>
            <option value="">from the header (else m)</option>
            <option value="m">m</option>
            <option value="mm">mm</option>
          </Select>
        </Field>
        <Field label="Elevation unit" error={result && !result.ok && result.needsUnit ? 'the header names no elevation unit: choose m or mm' : undefined}>
          <Select value={elevationUnit} onChange={(e) => setElevationUnit(e.target.value as typeof elevationUnit)}>
            <option value="">from the header</option>
            <option value="m">m</option>
            <option value="mm">mm</option>
          </Select>
        </Field>
      </div>
      {result?.ok && (
        <Notice tone="ok">
          Read {result.points} points over {formatSig(result.length, 3)} m, about every {formatSig(result.spacing, 3)} m; distance in {result.distanceUnit}, elevation in{' '}
          {result.elevationUnit}.
        </Notice>
      )}
      {result && !result.ok && !result.needsUnit && <Notice tone="danger">{result.reason}</Notice>}
      {serverError && <FormError message={serverError.message} />}
      <div>
        <Button type="submit" variant="primary" busy={upload.isPending} disabled={!file || !nameOk.success || (result !== null && !result.ok)}>
          Upload and save
        </Button>
      </div>
    </form>
  );
}
