import { useId, type ReactNode } from 'react';

/** A checkbox that adds or removes an optional part of the setup (a stop, the stroke, the gas). */
export function ToggleRow({ label, checked, onChange, hint }: { label: ReactNode; checked: boolean; onChange: (on: boolean) => void; hint?: ReactNode }) {
  const id = useId();
  return (
    <div className="flex items-center justify-between gap-3 border-b border-rule/50 py-1">
      <label htmlFor={id} className="flex items-center gap-2 text-sm text-ink">
        <input id={id} type="checkbox" checked={checked} onChange={(e) => onChange(e.target.checked)} className="size-3.5 accent-accent" />
        {label}
      </label>
      {hint && <span className="text-xs text-ink-faint">{hint}</span>}
    </div>
  );
}

/** A small choice inside a block (law kind, gas entry). */
export function ChoiceRow<T extends string>({ label, value, options, onChange }: { label: ReactNode; value: T; options: Array<[T, string]>; onChange: (v: T) => void }) {
  const id = useId();
  return (
    <div className="grid grid-cols-[minmax(0,1fr)_8.75rem] items-center gap-x-3 border-b border-rule/50 py-[3px]">
      <label htmlFor={id} className="text-sm text-ink-soft">
        {label}
      </label>
      <select id={id} value={value} onChange={(e) => onChange(e.target.value as T)} className="h-7 rounded-sm border border-rule-strong bg-paper-raised px-1.5 text-sm hover:border-ink-faint">
        {options.map(([v, words]) => (
          <option key={v} value={v}>
            {words}
          </option>
        ))}
      </select>
    </div>
  );
}

/** Two small text buttons under a list (add a coefficient or a point, remove the last). */
export function ListButtons({ onAdd, onRemove, canAdd, canRemove, what }: { onAdd: () => void; onRemove: () => void; canAdd: boolean; canRemove: boolean; what: string }) {
  return (
    <div className="flex justify-end gap-3 py-1 text-xs">
      <button type="button" disabled={!canRemove} onClick={onRemove} className="text-ink-soft hover:text-danger disabled:opacity-40">
        − remove last {what}
      </button>
      <button type="button" disabled={!canAdd} onClick={onAdd} className="text-accent hover:text-accent-strong disabled:opacity-40">
        + add {what}
      </button>
    </div>
  );
}
