import { toNestErrors } from '@hookform/resolvers';
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { type FieldError, type Resolver, useForm, useWatch, type UseFormReturn } from 'react-hook-form';
import type { SetupRevision } from '../../../../shared/schemas/setup-record.ts';
import { type Damper, Setup, type SetupInput } from '../../../../shared/schemas/setup.ts';

import type { Problem } from '../../../lib/plain-issue.ts';
import type { ChosenUnits } from '../../../lib/units/unit-table.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { setupIssueMessage } from './setup-problems.ts';

export type SetupForm = UseFormReturn<SetupInput, unknown, Setup>;

/** Validates the form with the shared schema, every message in page words and the units `units()` gives (one per field). */
const setupResolver =
  (units: () => ChosenUnits): Resolver<SetupInput, unknown, Setup> =>
  (values, _context, options) => {
    const parsed = Setup.safeParse(values);
    if (parsed.success) return { values: parsed.data, errors: {} };
    const errors: Record<string, FieldError> = {};
    for (const issue of parsed.error.issues) {
      const path = issue.path.map(String).join('.');
      errors[path] ??= { type: issue.code, message: setupIssueMessage(issue, values, units()) };
    }
    return { values: {}, errors: toNestErrors(errors, options) };
  };

/** The bench's working copy of a setup: the form, its current values, and the parsed setup when valid. */
export interface SetupDraft {
  form: SetupForm;
  /** Everything typed so far, valid or not. */
  values: SetupInput;
  /** The draft parsed with the shared schema; null while any field is wrong. */
  valid: Setup | null;
  /** The form differs from its revision (valid or not). */
  isDirty: boolean;
  /** Edits that are not in the form yet because they do not read (damper table cells), in words. */
  tableProblems: Problem[];
  /** Anything typed since the revision: form changes or table edits that do not read yet. */
  hasChanges: boolean;
  /** Bumped on every reset, so editors holding their own text (the damper tables) start over. */
  generation: number;
  /** For the damper tables: what in them does not read yet (empty once they do). */
  setTableProblems: (problems: Problem[]) => void;
  /** Throws away every edit, table text included. */
  discard: () => void;
  /** The revision the draft was started from (sent as `basedOn` when saving). */
  baseRevision: number;
  /** For the damper curve editor: replaces the damper and marks the form changed. */
  setDamper: (damper: SetupInput['damper']) => void;
  /** Starts over from a revision (after a save, a restore, or to discard edits). */
  resetTo: (revision: Pick<SetupRevision, 'number' | 'document'>) => void;
  /** Puts a document (a loaded file) into the form as unsaved changes. */
  load: (document: SetupInput) => void;
}

/** Optional top-level fields a form may add; listed so a clean form compares equal to its revision. */
const optionalKeys = ['tyreFootprint', 'tyreRadius', 'bumpStop', 'reboundStop', 'stroke', 'notes'] as const;

/**
 * The document with every optional key present (undefined when absent). The form's dirty check
 * compares key counts, and the inputs for optional fields add their keys on mount.
 */
function withAllKeys(document: SetupInput): SetupInput {
  const out = { ...document } as Record<string, unknown>;
  for (const key of optionalKeys) if (!(key in out)) out[key] = undefined;
  return out as SetupInput;
}

/**
 * Holds the draft of the bench. The form is validated by the shared `Setup` schema itself; the
 * page shows numbers in engineers' units but the form holds SI, converted by each input.
 */
export function useSetupDraft(revision: Pick<SetupRevision, 'number' | 'document'>): SetupDraft {
  const chosen = useUnits();
  // read when validating, so a resolver made once follows a change of units
  const unitsRef = useRef(chosen);
  unitsRef.current = chosen;
  const [resolver] = useState(() => setupResolver(() => unitsRef.current));
  const form = useForm<SetupInput, unknown, Setup>({ resolver, defaultValues: withAllKeys(revision.document), mode: 'onChange' });
  const [baseRevision, setBaseRevision] = useState(revision.number);
  const [tableProblems, setTableProblemsState] = useState<Problem[]>([]);
  const [generation, setGeneration] = useState(0);
  // compared by content: the tables report on every render of theirs
  const setTableProblems = useCallback((next: Problem[]) => {
    setTableProblemsState((prev) => (JSON.stringify(prev) === JSON.stringify(next) ? prev : next));
  }, []);
  const watched = useWatch({ control: form.control }) as SetupInput;
  const { isDirty } = form.formState;

  const resetTo = useCallback(
    (r: Pick<SetupRevision, 'number' | 'document'>) => {
      form.reset(withAllKeys(r.document));
      setBaseRevision(r.number);
      setTableProblemsState([]);
      setGeneration((g) => g + 1);
    },
    [form],
  );

  const discard = useCallback(() => {
    form.reset();
    setTableProblemsState([]);
    setGeneration((g) => g + 1);
  }, [form]);

  // A newer revision saved elsewhere replaces a clean draft; a draft with edits stays, and its
  // save is refused by the server (basedOn) rather than overwriting what was saved meanwhile.
  useEffect(() => {
    if (revision.number !== baseRevision && !form.formState.isDirty && tableProblems.length === 0) resetTo(revision);
  }, [revision, baseRevision, form, resetTo, tableProblems.length]);

  const values = watched ?? revision.document;
  const valid = useMemo(() => {
    const parsed = Setup.safeParse(values);
    return parsed.success ? parsed.data : null;
  }, [values]);

  const setDamper = useCallback(
    (damper: SetupInput['damper'] | Damper) => form.setValue('damper', damper as SetupInput['damper'], { shouldDirty: true, shouldValidate: true }),
    [form],
  );

  const load = useCallback(
    (document: SetupInput) => {
      for (const [key, value] of Object.entries(document)) {
        form.setValue(key as keyof SetupInput, value as never, { shouldDirty: true, shouldValidate: true });
      }
      for (const key of optionalKeys) {
        if (!(key in document)) form.setValue(key, undefined, { shouldDirty: true, shouldValidate: true });
      }
    },
    [form],
  );

  const hasChanges = isDirty || tableProblems.length > 0;
  return { form, values, valid, isDirty, tableProblems, hasChanges, generation, setTableProblems, discard, baseRevision, setDamper, resetTo, load };
}
