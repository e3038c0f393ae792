import { useId, useState, type ReactNode } from 'react';
import { useController, type Control, type FieldPath } from 'react-hook-form';
import type { Setup, SetupInput } from '../../../../../shared/schemas/setup.ts';
import type { DisplayUnit } from '../../../../lib/format.ts';
import { editableNumber, parseTyped } from '../../model/setup-units.ts';

export interface QuantityRowProps {
  control: Control<SetupInput, unknown, Setup>;
  name: FieldPath<SetupInput>;
  label: ReactNode;
  /** How the SI value in the form is shown and typed. */
  unit: DisplayUnit;
  /** Blank means "not given" (undefined) instead of an error. */
  optional?: boolean;
  hint?: ReactNode;
}

/**
 * One quantity of the form: label on the left, the number in the engineer's unit on the
 * right, the problem under it. The form keeps SI; this row converts on the way in and out and
 * keeps the text as typed while the field has focus (so "20." is not rewritten mid-word).
 */
export function QuantityRow({ control, name, label, unit, optional = false, hint }: QuantityRowProps) {
  const id = useId();
  const { field, fieldState } = useController({ control, name });
  const [typing, setTyping] = useState<string | null>(null);
  const si = field.value as unknown;
  const shown = typing ?? (typeof si === 'number' && Number.isFinite(si) ? editableNumber(unit.fromSI(si)) : '');
  const error = fieldState.error?.message;

  return (
    <div className="grid grid-cols-[minmax(0,1fr)_8.75rem] items-center gap-x-3 border-b border-rule/50 py-[3px] last:border-0">
      <label htmlFor={id} className="truncate text-sm text-ink-soft">
        {label}
      </label>
      <div className="relative">
        <input
          id={id}
          ref={field.ref}
          name={field.name}
          inputMode="decimal"
          autoComplete="off"
          spellCheck={false}
          value={shown}
          placeholder={optional ? '—' : undefined}
          aria-invalid={error ? true : undefined}
          aria-describedby={error || hint ? `${id}-msg` : undefined}
          onChange={(e) => {
            setTyping(e.target.value);
            const n = parseTyped(e.target.value);
            field.onChange(n === undefined ? (optional ? undefined : Number.NaN) : Number.isNaN(n) ? Number.NaN : unit.toSI(n));
          }}
          onBlur={() => {
            setTyping(null);
            field.onBlur();
          }}
          className={`figures h-7 w-full rounded-sm border bg-paper-raised pr-14 pl-2 text-right text-sm text-ink transition-colors hover:border-ink-faint focus-visible:border-accent focus-visible:outline-offset-0 ${
            error ? 'border-danger' : 'border-rule-strong'
          }`}
        />
        <span className="pointer-events-none absolute top-1/2 right-2 -translate-y-1/2 text-xs font-light text-ink-faint">{unit.symbol}</span>
      </div>
      {(error || hint) && (
        <p id={`${id}-msg`} role={error ? 'alert' : undefined} className={`col-span-2 text-right text-xs ${error ? 'text-danger' : 'text-ink-faint'}`}>
          {error ?? hint}
        </p>
      )}
    </div>
  );
}

/** A figure computed from the fields above it (wheel rate), shown in the same grid, not editable. */
export function DerivedRow({ label, children }: { label: ReactNode; children: ReactNode }) {
  return (
    <div className="grid grid-cols-[minmax(0,1fr)_8.75rem] items-center gap-x-3 border-b border-rule/50 py-[3px] last:border-0">
      <span className="truncate text-sm text-ink-faint italic">{label}</span>
      <span className="pr-2 text-right text-sm">{children}</span>
    </div>
  );
}

/** A titled group of rows, as on a printed spec sheet. */
export function FormBlock({ title, aside, children }: { title: ReactNode; aside?: ReactNode; children: ReactNode }) {
  return (
    <fieldset className="mb-4 min-w-0">
      <div className="mb-1 flex items-baseline justify-between gap-3 border-b border-rule-strong pb-0.5">
        <legend className="float-left text-2xs font-semibold tracking-wider text-ink-faint uppercase">{title}</legend>
        {aside}
      </div>
      <div className="clear-both">{children}</div>
    </fieldset>
  );
}
