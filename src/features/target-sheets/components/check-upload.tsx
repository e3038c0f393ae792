import { useId, useRef, useState } from 'react';
import { DYNO_CHECK_MAX_FILES } from '../../../../shared/schemas/target-sheet.ts';
import { Button } from '../../../components/ui/button.tsx';
import { FormError, Input, Select } from '../../../components/ui/field.tsx';
import { isApiError } from '../../../lib/api-client.ts';
import { type FileReading, useUploadCheck } from '../api/upload-check.ts';

const stem = (name: string) => name.replace(/\.[A-Za-z0-9]{1,5}$/, '');

/**
 * Upload of dyno files against a sheet, one file per physical damper, each with its own label
 * (the serial on the part). Every file is read on the server before anything is kept; a bad
 * file is refused by file and line.
 */
export function CheckUpload({ workspaceId, sheetId, gasForce }: { workspaceId: string; sheetId: string; gasForce: number }) {
  const upload = useUploadCheck(workspaceId, sheetId);
  const inputRef = useRef<HTMLInputElement>(null);
  const fileId = useId();
  const [files, setFiles] = useState<({ file: File; label: string } & FileReading)[]>([]);
  const [withGas, setWithGas] = useState(false);
  const [problem, setProblem] = useState<string>();
  const setFile = (i: number, patch: Partial<FileReading & { label: string }>) => setFiles(files.map((x, j) => (j === i ? { ...x, ...patch } : x)));

  const choose = (list: FileList | null) => {
    const chosen = [...(list ?? [])].slice(0, DYNO_CHECK_MAX_FILES);
    setFiles(chosen.map((file) => ({ file, label: stem(file.name), velocityUnit: '', forceUnit: '', sign: '' })));
    setProblem(list && list.length > DYNO_CHECK_MAX_FILES ? `Only the first ${DYNO_CHECK_MAX_FILES} files are kept.` : undefined);
    upload.reset();
  };

  const send = () => {
    if (files.length === 0) return setProblem('Choose one dyno file per damper.');
    upload.mutate(
      { files, gasForce: withGas ? gasForce : 0 },
      {
        onSuccess: () => {
          setFiles([]);
          if (inputRef.current) inputRef.current.value = '';
        },
      },
    );
  };

  const lines = isApiError(upload.error) ? upload.error.fields.filter((f) => f.path.startsWith('line')) : [];

  return (
    <div className="space-y-3 rounded border border-rule bg-paper-raised px-4 py-3" aria-label="Check dampers against this sheet" role="group">
      <div className="flex flex-wrap items-end gap-4">
        <div className="flex flex-col gap-1">
          <label htmlFor={fileId} className="text-sm font-medium text-ink-soft">
            Dyno files, one per damper (CSV)
          </label>
          <input
            id={fileId}
            ref={inputRef}
            type="file"
            multiple
            accept=".csv,.txt,text/csv,text/plain"
            className="text-sm file:mr-3 file:rounded file:border file:border-rule-strong file:bg-paper file:px-2.5 file:py-1 file:text-sm"
            onChange={(e) => choose(e.target.files)}
          />
        </div>
        <label className="flex items-center gap-2 pb-2 text-sm">
          <input type="checkbox" checked={withGas} onChange={(e) => setWithGas(e.target.checked)} />
          Readings include the gas force (take {gasForce} N out)
        </label>
      </div>

      {files.length > 0 && (
        <div>
          <p className="mb-1 text-xs text-ink-faint">Each file is read in its own units and signs; a unit written in a column header wins over the choice here.</p>
          <div aria-hidden="true" className="mb-1 hidden grid-cols-[minmax(8rem,1fr)_9rem_12rem_12rem_9rem] gap-2 text-xs text-ink-faint md:grid">
            <span>File</span>
            <span>Damper label</span>
            <span>Speed unit</span>
            <span>Force unit</span>
            <span>Sign convention</span>
          </div>
          <ul className="grid gap-2" aria-label="Dampers to check">
            {files.map((f, i) => (
              <li key={`${f.file.name}-${i}`} className="grid grid-cols-2 items-center gap-2 md:grid-cols-[minmax(8rem,1fr)_9rem_12rem_12rem_9rem]">
                <span className="col-span-2 min-w-0 truncate text-sm text-ink-soft md:col-span-1" title={f.file.name}>
                  {f.file.name}
                </span>
                <Input aria-label={`Damper label for ${f.file.name}`} value={f.label} maxLength={120} className="h-8 text-sm" onChange={(e) => setFile(i, { label: e.target.value })} />
                <Select aria-label={`Speed unit of ${f.file.name}`} value={f.velocityUnit} className="h-8 text-sm" onChange={(e) => setFile(i, { velocityUnit: e.target.value as FileReading['velocityUnit'] })}>
                  <option value="">as headed, else m/s</option>
                  <option value="m/s">m/s</option>
                  <option value="mm/s">mm/s</option>
                  <option value="in/s">in/s</option>
                </Select>
                <Select aria-label={`Force unit of ${f.file.name}`} value={f.forceUnit} className="h-8 text-sm" onChange={(e) => setFile(i, { forceUnit: e.target.value as FileReading['forceUnit'] })}>
                  <option value="">as headed, else N</option>
                  <option value="N">N</option>
                  <option value="kN">kN</option>
                  <option value="lbf">lbf</option>
                </Select>
                <Select aria-label={`Sign convention of ${f.file.name}`} value={f.sign} className="h-8 text-sm" onChange={(e) => setFile(i, { sign: e.target.value as FileReading['sign'] })}>
                  <option value="">compression +</option>
                  <option value="extension-positive">extension +</option>
                </Select>
              </li>
            ))}
          </ul>
        </div>
      )}

      <div className="flex items-center gap-3">
        <Button variant="primary" size="sm" busy={upload.isPending} onClick={send}>
          Check {files.length > 1 ? `${files.length} dampers` : 'damper'}
        </Button>
        <span className="text-xs text-ink-faint">Peak files (speed and force per direction) or raw records (time, displacement, force).</span>
      </div>
      {problem && <p className="text-sm text-signal-ink">{problem}</p>}
      {upload.error && (
        <div>
          <FormError message={upload.error.message} />
          {lines.length > 1 && (
            <ul className="mt-1 list-inside list-disc text-sm text-danger">
              {lines.map((l, i) => (
                <li key={i}>{l.message}</li>
              ))}
            </ul>
          )}
        </div>
      )}
    </div>
  );
}
