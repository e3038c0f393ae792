import { useState } from 'react';
import type { DriveItem } from '../../../../shared/schemas/drive.ts';
import { Button } from '../../../components/ui/button.tsx';
import { Field, Input } from '../../../components/ui/field.tsx';
import { Notice } from '../../../components/ui/notice.tsx';
import { isApiError } from '../../../lib/api-client.ts';
import { useUploadDrive } from '../api/upload-drive.ts';

/** Upload of one drive log; the server reads it and lists every problem by line and column. */
export function DriveUpload({ workspaceId, setupId, onUploaded }: { workspaceId: string; setupId: string; onUploaded: (d: DriveItem) => void }) {
  const upload = useUploadDrive(workspaceId, setupId);
  const [file, setFile] = useState<File | null>(null);
  const [note, setNote] = useState('');
  const error = upload.error;
  return (
    <div className="grid gap-3">
      <p className="text-xs text-ink-soft">
        A CSV with a header row naming each column and its unit in brackets: <code>time [s]</code>, <code>speed [km/h]</code> and any of <code>body accel [g]</code>, <code>wheel accel [m/s^2]</code>,{' '}
        <code>damper travel [mm]</code>, <code>wheel travel [mm]</code>. Accelerations up positive, travel positive in compression.
      </p>
      <div className="flex flex-wrap items-end gap-3">
        <Field label="Drive log (CSV)">
          <Input type="file" accept=".csv,text/csv,text/plain" onChange={(e) => setFile(e.target.files?.[0] ?? null)} />
        </Field>
        <Field label="Note (optional)" className="min-w-64 flex-1">
          <Input value={note} maxLength={200} onChange={(e) => setNote(e.target.value)} placeholder="e.g. test lane, 13 m/s, driver 2" />
        </Field>
        <Button variant="primary" disabled={!file} busy={upload.isPending} onClick={() => file && upload.mutate({ file, note }, { onSuccess: onUploaded })}>
          Upload the drive
        </Button>
      </div>
      {error && (
        <Notice tone="danger" title="The drive was not saved">
          {isApiError(error) && error.fields.length > 1 ? (
            <ul className="list-disc pl-5">
              {error.fields.map((f, i) => (
                <li key={i}>
                  {f.path}: {f.message}
                </li>
              ))}
            </ul>
          ) : (
            error.message
          )}
        </Notice>
      )}
    </div>
  );
}
