import { type KeyboardEvent, type ReactNode, useId, useRef } from 'react';

export interface TabItem<K extends string> {
  key: K;
  label: ReactNode;
  /** A short figure beside the label ("3 files"). */
  count?: ReactNode;
  panel: ReactNode;
  /** Keep the panel (hidden) while another tab is shown, so what is typed in it survives a look elsewhere. */
  keepMounted?: boolean;
}

/**
 * One row of tabs and the chosen panel under it (WAI-ARIA tabs: arrow keys move between tabs,
 * only the chosen tab is in the tab order). Controlled, so a page can open a tab on purpose.
 * Only the chosen panel is drawn, unless a panel asks to be kept (hidden) while away.
 */
export function Tabs<K extends string>({ label, items, value, onChange }: { label: string; items: TabItem<K>[]; value: K; onChange: (key: K) => void }) {
  const id = useId();
  const refs = useRef(new Map<K, HTMLButtonElement>());
  const move = (e: KeyboardEvent, at: number) => {
    const step = e.key === 'ArrowRight' ? 1 : e.key === 'ArrowLeft' ? -1 : 0;
    const to = e.key === 'Home' ? 0 : e.key === 'End' ? items.length - 1 : step ? (at + step + items.length) % items.length : -1;
    if (to < 0) return;
    e.preventDefault();
    onChange(items[to].key);
    refs.current.get(items[to].key)?.focus();
  };
  const chosen = items.find((t) => t.key === value) ?? items[0];
  return (
    <div>
      <div role="tablist" aria-label={label} className="flex flex-wrap gap-1 border-b border-rule-strong">
        {items.map((t, i) => {
          const on = t.key === chosen.key;
          return (
            <button
              key={t.key}
              ref={(el) => void (el ? refs.current.set(t.key, el) : refs.current.delete(t.key))}
              type="button"
              role="tab"
              id={`${id}-${t.key}`}
              aria-selected={on}
              aria-controls={on || t.keepMounted ? `${id}-${t.key}-panel` : undefined}
              tabIndex={on ? 0 : -1}
              onClick={() => onChange(t.key)}
              onKeyDown={(e) => move(e, i)}
              className={`-mb-px rounded-t border px-3 py-1.5 text-sm ${on ? 'border-rule-strong border-b-paper bg-paper font-semibold text-ink' : 'border-transparent text-ink-soft hover:text-ink'}`}
            >
              {t.label}
              {t.count !== undefined && <span className="ml-1.5 text-xs font-normal text-ink-faint">{t.count}</span>}
            </button>
          );
        })}
      </div>
      {items
        .filter((t) => t.key === chosen.key || t.keepMounted)
        .map((t) => (
          <div key={t.key} role="tabpanel" id={`${id}-${t.key}-panel`} aria-labelledby={`${id}-${t.key}`} hidden={t.key !== chosen.key} className="pt-4">
            {t.panel}
          </div>
        ))}
    </div>
  );
}
