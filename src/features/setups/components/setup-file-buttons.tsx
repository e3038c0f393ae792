import { useRef, useState } from 'react';
import type { FieldIssue } from '../../../../shared/errors.ts';
import type { SetupDetail } from '../../../../shared/schemas/setup-record.ts';
import type { Setup } from '../../../../shared/schemas/setup.ts';
import { Button } from '../../../components/ui/button.tsx';
import { isApiError } from '../../../lib/api-client.ts';
import { useImportSetup } from '../api/import-setup.ts';
import { readSetupFile } from '../model/read-setup-file.ts';

function Problems({ message, issues }: { message: string; issues: FieldIssue[] }) {
  return (
    <div role="alert" className="mt-2 rounded border border-danger/30 bg-danger-wash px-3 py-2 text-sm text-danger">
      <p className="font-semibold">{message}</p>
      {issues.length > 0 && (
        <ul className="mt-1 list-inside list-disc text-xs">
          {issues.slice(0, 12).map((i) => (
            <li key={`${i.path}:${i.message}`}>
              <code className="figures">{i.path}</code>: {i.message}
            </li>
          ))}
          {issues.length > 12 && <li>and {issues.length - 12} more</li>}
        </ul>
      )}
    </div>
  );
}

/** A button that opens the file picker for `.json` setup files. */
function FilePick({ label, busy, onFile }: { label: string; busy?: boolean; onFile: (f: File) => void }) {
  const input = useRef<HTMLInputElement>(null);
  return (
    <>
      <input
        ref={input}
        type="file"
        accept=".json,application/json"
        className="sr-only"
        tabIndex={-1}
        aria-label={label}
        onChange={(e) => {
          const file = e.target.files?.[0];
          e.target.value = '';
          if (file) onFile(file);
        }}
      />
      <Button busy={busy} onClick={() => input.current?.click()}>
        {label}
      </Button>
    </>
  );
}

/**
 * Imports a setup file as a new setup: checked here first with the shared schema (problems
 * named by their place in the file), then again by the server; nothing is saved on a problem.
 */
export function ImportSetupButton({ workspaceId, onImported }: { workspaceId: string; onImported: (detail: SetupDetail) => void }) {
  const importing = useImportSetup(workspaceId);
  const [problem, setProblem] = useState<{ message: string; issues: FieldIssue[] } | null>(null);
  return (
    <div className="relative">
      <FilePick
        label="Import setup file"
        busy={importing.isPending}
        onFile={async (file) => {
          setProblem(null);
          const checked = await readSetupFile(file);
          if (!checked.ok) return setProblem({ message: `${file.name}: ${checked.message} Nothing was imported.`, issues: checked.issues });
          importing.mutate(
            { file: checked.json },
            {
              onSuccess: onImported,
              onError: (error) => setProblem({ message: error.message, issues: isApiError(error) ? error.fields : [] }),
            },
          );
        }}
      />
      {problem && (
        <div className="absolute right-0 z-10 mt-1 w-[28rem]">
          <Problems {...problem} />
        </div>
      )}
    </div>
  );
}

/** Loads a setup file into the bench's form as unsaved changes (saved only as a new revision). */
export function LoadSetupFileButton({ onLoad }: { onLoad: (setup: Setup, fileName: string) => void }) {
  const [problem, setProblem] = useState<{ message: string; issues: FieldIssue[] } | null>(null);
  return (
    <div className="relative">
      <FilePick
        label="Load file…"
        onFile={async (file) => {
          setProblem(null);
          const checked = await readSetupFile(file);
          if (!checked.ok) return setProblem({ message: `${file.name}: ${checked.message} The form is unchanged.`, issues: checked.issues });
          onLoad(checked.setup, file.name);
        }}
      />
      {problem && (
        <div className="absolute right-0 z-10 mt-1 w-[28rem]">
          <Problems {...problem} />
          <button type="button" className="mt-1 text-xs text-ink-soft underline" onClick={() => setProblem(null)}>
            Close
          </button>
        </div>
      )}
    </div>
  );
}
