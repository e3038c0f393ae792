import { useEffect, useState } from 'react';
import { copyText } from '../../lib/copy-text.ts';
import { formatQuantity, formatSig, type UnitRef } from '../../lib/format.ts';

export interface FigureProps {
  /** The value in SI; converted to `unit` for display. */
  value: number;
  /** Display unit (see `units` in lib/format). Leave out for a bare number. */
  unit?: UnitRef;
  /** Significant figures, 3 unless the user asked for more. */
  digits?: number;
  /** What the number is, for screen readers and the copy tooltip ("body RMS acceleration"). */
  label?: string;
  className?: string;
}

/**
 * One figure: monospaced tabular digits, the unit beside it in a lighter weight. Clicking it
 * copies the number as shown (with an ASCII minus so spreadsheets read it).
 */
export function Figure({ value, unit, digits = 3, label, className = '' }: FigureProps) {
  const shown = unit ? formatQuantity(value, unit, digits) : { number: formatSig(value, digits), unit: '' };
  const [copied, setCopied] = useState(false);

  useEffect(() => {
    if (!copied) return;
    const timer = window.setTimeout(() => setCopied(false), 1200);
    return () => window.clearTimeout(timer);
  }, [copied]);

  const plain = shown.number.replace('\u2212', '-');
  const title = `${label ? `${label}: ` : ''}${plain}${shown.unit ? ` ${shown.unit}` : ''} — click to copy`;

  return (
    <button
      type="button"
      title={title}
      aria-label={label ? `${label} ${plain} ${shown.unit}`.trim() : undefined}
      onClick={() => void copyText(plain).then(setCopied)}
      className={`figures relative inline-flex items-baseline gap-[0.2em] rounded-sm px-0.5 text-ink hover:bg-accent-wash/70 ${className}`}
    >
      <span>{shown.number}</span>
      {shown.unit && <span className="text-[0.86em] font-light text-ink-faint">{shown.unit}</span>}
      {copied && (
        <span role="status" className="absolute -top-5 left-1/2 -translate-x-1/2 rounded-sm bg-ink px-1 font-sans text-2xs text-paper">
          copied
        </span>
      )}
    </button>
  );
}
