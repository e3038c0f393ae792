import type { ReactNode } from 'react';
import { Figure } from '../../../components/ui/figure.tsx';
import type { UnitRef } from '../../../lib/format.ts';

export interface FigureItem {
  label: ReactNode;
  /** Plain name for screen readers and the copy tooltip. */
  name: string;
  value: number | undefined;
  unit?: UnitRef;
  digits?: number;
  /** Shown in the signal colour. */
  warn?: boolean;
  /** A short remark under the label. */
  note?: ReactNode;
}

/** Label on the left, figure on the right, hairline between rows. */
export function FigureList({ items }: { items: FigureItem[] }) {
  return (
    <dl className="divide-y divide-rule/70">
      {items.map((item) => (
        <div key={item.name} className="flex items-baseline justify-between gap-3 py-1">
          <dt className="min-w-0 text-sm text-ink-soft">
            {item.label}
            {item.note && <span className="block text-2xs leading-tight text-ink-faint">{item.note}</span>}
          </dt>
          <dd className={`shrink-0 text-sm ${item.warn ? 'font-semibold [&_*]:!text-signal-ink' : ''}`} data-figure={item.name}>
            {item.value === undefined ? (
              <span className="text-ink-faint">—</span>
            ) : (
              <Figure value={item.value} unit={item.unit} digits={item.digits} label={item.name} />
            )}
          </dd>
        </div>
      ))}
    </dl>
  );
}

/** A titled block of figures; `hue` colours the title rule (comfort and grip keep their hue everywhere). */
export function FigurePanel({ title, hue, children, aside }: { title: string; hue?: 'comfort' | 'grip'; children: ReactNode; aside?: ReactNode }) {
  const rule = hue === 'comfort' ? 'border-comfort' : hue === 'grip' ? 'border-grip' : 'border-ink-soft';
  const text = hue === 'comfort' ? 'text-comfort' : hue === 'grip' ? 'text-grip' : 'text-ink';
  return (
    <section aria-label={title} className="flex flex-col rounded border border-rule bg-paper-raised px-3 pt-2 pb-2.5">
      <header className={`mb-1 flex items-baseline justify-between gap-2 border-b-2 pb-1 ${rule}`}>
        <h3 className={`text-sm font-semibold tracking-wide uppercase ${text}`}>{title}</h3>
        {aside}
      </header>
      {children}
    </section>
  );
}
