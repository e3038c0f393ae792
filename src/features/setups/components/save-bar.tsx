import { type ReactNode, useEffect, useId, useMemo, useRef, useState } from 'react';
import type { Setup } from '../../../../shared/schemas/setup.ts';
import { Button } from '../../../components/ui/button.tsx';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { setupProblems } from '../model/setup-problems.ts';
import type { SetupDraft } from '../model/use-setup-draft.ts';

export interface SaveBarProps {
  draft: SetupDraft;
  /** Number the next revision will get. */
  nextNumber: number;
  saving: boolean;
  /** A refusal from the server, in words (may carry a link to what it refers to). */
  error?: ReactNode;
  /** The message the field starts with (a study point names its study and point); the engineer may change it. */
  initialMessage?: string;
  onSave: (setup: Setup, message: string) => void;
}

/** Problems of the draft in words: table cells that do not read yet first, then the schema's. */
function useProblems(draft: SetupDraft) {
  const { values, tableProblems } = draft;
  const units = useUnits();
  return useMemo(() => {
    // while a table does not read, the form still holds the last valid curve: its issues would be stale
    const fromForm = setupProblems(values, units).filter((p) => !(tableProblems.length > 0 && p.path.startsWith('damper.')));
    return [...tableProblems, ...fromForm];
  }, [values, tableProblems, units]);
}

function statusText(draft: SetupDraft, problemCount: number): string {
  if (!draft.hasChanges) return `No changes since revision ${draft.baseRevision}`;
  if (problemCount === 0) return `Unsaved changes to revision ${draft.baseRevision}`;
  return `Unsaved changes to revision ${draft.baseRevision}, ${problemCount === 1 ? 'one of them invalid' : `${problemCount} values invalid`}`;
}

/**
 * Saving is always a new revision with a message saying what changed. The bar states whether
 * there is anything to save, and why it cannot be saved yet.
 */
export function SaveBar({ draft, nextNumber, saving, error, initialMessage = '', onSave }: SaveBarProps) {
  const id = useId();
  const [message, setMessage] = useState(initialMessage);
  const problems = useProblems(draft);
  const canSave = draft.hasChanges && problems.length === 0 && message.trim().length > 0 && !saving;

  // The message is cleared once a save has made a new revision; a refused save keeps it for another try.
  const savedFrom = useRef(draft.baseRevision);
  useEffect(() => {
    if (draft.baseRevision !== savedFrom.current) {
      savedFrom.current = draft.baseRevision;
      setMessage('');
    }
  }, [draft.baseRevision]);

  const submit = draft.form.handleSubmit((setup) => onSave(setup, message.trim()));

  return (
    <form
      aria-label="Save as a new revision"
      onSubmit={(e) => {
        e.preventDefault();
        if (canSave) void submit();
      }}
      className={`rounded border px-3 py-2 ${problems.length > 0 ? 'border-danger/60 bg-danger-wash/40' : draft.hasChanges ? 'border-accent/50 bg-accent-wash/50' : 'border-rule bg-paper-raised'}`}
    >
      <div className="mb-1.5 flex items-baseline justify-between gap-2 text-xs">
        <span data-testid="save-status" className={problems.length > 0 ? 'font-semibold text-danger' : draft.hasChanges ? 'font-semibold text-accent-strong' : 'text-ink-faint'}>
          {statusText(draft, problems.length)}
        </span>
        {draft.hasChanges && (
          <button type="button" className="shrink-0 text-ink-soft underline-offset-2 hover:text-danger hover:underline" onClick={draft.discard}>
            Discard changes
          </button>
        )}
      </div>
      <div className="flex flex-wrap gap-2">
        <label htmlFor={id} className="sr-only">
          What changed
        </label>
        <input
          id={id}
          value={message}
          maxLength={500}
          onChange={(e) => setMessage(e.target.value)}
          title={message || undefined}
          placeholder="What changed, in a few words"
          disabled={!draft.hasChanges}
          className="h-8 min-w-48 flex-1 rounded-sm border border-rule-strong bg-paper-raised px-2 text-sm disabled:bg-paper-sunk"
        />
        <Button type="submit" variant="primary" size="sm" className="ml-auto h-8" disabled={!canSave} busy={saving}>
          Save my edits as revision {nextNumber}
        </Button>
      </div>
      {problems.length > 0 && (
        <div role="alert" className="mt-2 text-xs text-danger">
          <p className="font-semibold">
            {problems.length === 1 ? 'One value is wrong' : `${problems.length} values are wrong`}; fix {problems.length === 1 ? 'it' : 'them'} to save:
          </p>
          <ul className="mt-0.5 list-inside list-disc" aria-label="Values to fix">
            {problems.slice(0, 6).map((p) => (
              <li key={`${p.path}-${p.message}`}>{p.message}</li>
            ))}
            {problems.length > 6 && <li>and {problems.length - 6} more, marked beside their fields</li>}
          </ul>
        </div>
      )}
      {error && (
        <div role="alert" className="mt-2 text-xs text-danger">
          {error}
        </div>
      )}
    </form>
  );
}
