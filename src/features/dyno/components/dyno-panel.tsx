import { useState } from 'react';
import { Button } from '../../../components/ui/button.tsx';
import { Notice } from '../../../components/ui/notice.tsx';
import { Loading } from '../../../components/ui/spinner.tsx';
import { formatDateTime } from '../../../lib/format.ts';
import { useDynoFile } from '../api/get-dyno-file.ts';
import { useDynoFiles } from '../api/get-dyno-files.ts';
import { FitPanel } from './fit-panel.tsx';
import { UploadPanel } from './upload-panel.tsx';

export interface DynoPanelProps {
  workspaceId: string;
  setupId: string;
  /** The setup's latest revision number (the fit is saved as the next one). */
  latestRevision: number;
  /** Hides upload and apply (viewers). */
  readOnly?: boolean;
  /** The setup's static gas force, N, offered as the offset to take out of the readings. */
  gasForceHint?: number;
  /** The bench has edits not saved yet: the fit's revision will not include them, and says so. */
  draftHasChanges?: boolean;
  /** Called after a fit was saved as a new revision. */
  onApplied?: (revisionNumber: number) => void;
}

/**
 * Dyno files of one setup: upload (engineers), the files kept with who uploaded them and the
 * revision each produced, and the fit of the chosen file.
 */
export function DynoPanel({ workspaceId, setupId, latestRevision, readOnly, draftHasChanges, gasForceHint, onApplied }: DynoPanelProps) {
  const files = useDynoFiles(workspaceId, setupId);
  const [selected, setSelected] = useState<string | null>(null);
  const [uploading, setUploading] = useState(false);
  const current = selected ?? files.data?.files[0]?.id ?? null;
  const detail = useDynoFile(workspaceId, setupId, current);

  return (
    <div className="grid gap-4" data-testid="dyno-panel">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div className="min-w-0">
          {files.isPending ? (
            <Loading what="dyno files" />
          ) : files.isError ? (
            <Notice tone="danger">{files.error.message}</Notice>
          ) : files.data.files.length === 0 ? (
            <p className="text-sm text-ink-faint">No dyno files for this setup yet.</p>
          ) : (
            <ul className="grid gap-1 text-sm" aria-label="Dyno files">
              {files.data.files.map((f) => (
                <li key={f.id}>
                  <button
                    type="button"
                    onClick={() => setSelected(f.id)}
                    aria-current={f.id === current || undefined}
                    className={`rounded px-2 py-1 text-left hover:bg-accent-wash ${f.id === current ? 'bg-accent-wash font-medium text-accent-strong' : ''}`}
                  >
                    {f.filename}
                    <span className="ml-2 text-xs text-ink-faint">
                      {f.summary.peaks.compression.length + f.summary.peaks.rebound.length} points · {f.uploadedBy.name}, {formatDateTime(f.createdAt)}
                      {f.producedRevision && ` · made revision ${f.producedRevision.number}`}
                    </span>
                  </button>
                </li>
              ))}
            </ul>
          )}
        </div>
        {!readOnly && !uploading && (
          <Button size="sm" variant="secondary" onClick={() => setUploading(true)}>
            Upload a dyno file
          </Button>
        )}
      </div>
      {!readOnly && uploading && (
        <div className="rounded border border-rule bg-paper-raised p-3">
          <UploadPanel
            workspaceId={workspaceId}
            setupId={setupId}
            gasForceHint={gasForceHint}
            onUploaded={(f) => {
              setSelected(f.id);
              setUploading(false);
            }}
          />
          <Button size="sm" variant="quiet" className="mt-2" onClick={() => setUploading(false)}>
            Close
          </Button>
        </div>
      )}
      {current && (detail.isPending ? <Loading what="the dyno file" /> : detail.isError ? <Notice tone="danger">{detail.error.message}</Notice> : <FitPanel key={detail.data.id} workspaceId={workspaceId} setupId={setupId} file={detail.data} latestRevision={latestRevision} readOnly={readOnly} draftHasChanges={draftHasChanges} onApplied={onApplied} />)}
    </div>
  );
}
