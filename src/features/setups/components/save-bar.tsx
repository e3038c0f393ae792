import { type ReactNode, useEffect, useId, useMemo, useRef, useState } from 'react';
import { Setup } from '../../../../shared/schemas/setup.ts';
import { Button } from '../../../components/ui/button.tsx';
import { describePath } from '../model/setup-diff.ts';
import type { SetupDraft } from '../model/use-setup-draft.ts';
import { friendlyError } from './form/field-errors.ts';

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

/** Problems of the draft with the field they belong to, for the ones no visible input carries (curve points). */
function useProblems(values: unknown) {
  return useMemo(() => {
    const parsed = Setup.safeParse(values);
    if (parsed.success) return [];
    return parsed.error.issues.map((i) => {
      const path = i.path.map(String).join('.');
      return { path, label: describePath(path).label, message: friendlyError(i.message) ?? i.message };
    });
  }, [values]);
}

/**
 * Saving is always a new revision with a message saying what changed. The bar states whether
 * there is anything to save, and why it cannot be saved yet.
 */
export function SaveBar({ draft, nextNumber, saving, error, initialMessage = '', onSave }: SaveBarProps) {
  const id = useId();
  const [message, setMessage] = useState(initialMessage);
  const problems = useProblems(draft.values);
  const canSave = draft.isDirty && problems.length === 0 && message.trim().length > 0 && !saving;

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
      className={`rounded border px-3 py-2 ${draft.isDirty ? 'border-accent/50 bg-accent-wash/50' : 'border-rule bg-paper-raised'}`}
    >
      <div className="mb-1.5 flex items-baseline justify-between gap-2 text-xs">
        <span className={draft.isDirty ? 'font-semibold text-accent-strong' : 'text-ink-faint'}>
          {draft.isDirty ? `Unsaved changes to revision ${draft.baseRevision}` : `No changes since revision ${draft.baseRevision}`}
        </span>
        {draft.isDirty && (
          <button type="button" className="text-ink-soft underline-offset-2 hover:text-danger hover:underline" onClick={() => draft.form.reset()}>
            Discard changes
          </button>
        )}
      </div>
      <div className="flex gap-2">
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
          disabled={!draft.isDirty}
          className="h-8 min-w-0 flex-1 rounded-sm border border-rule-strong bg-paper-raised px-2 text-sm disabled:bg-paper-sunk"
        />
        <Button type="submit" variant="primary" size="sm" className="h-8" disabled={!canSave} busy={saving}>
          Save as revision {nextNumber}
        </Button>
      </div>
      {problems.length > 0 && (
        <div role="alert" className="mt-2 text-xs text-danger">
          <p className="font-semibold">
            {problems.length === 1 ? 'One value needs attention' : `${problems.length} values need attention`} before this can be saved:
          </p>
          <ul className="mt-0.5 list-inside list-disc">
            {problems.slice(0, 6).map((p) => (
              <li key={`${p.path}-${p.message}`}>
                {p.label}: {p.message}
              </li>
            ))}
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
