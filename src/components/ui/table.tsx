import type { HTMLAttributes, ReactNode, TdHTMLAttributes, ThHTMLAttributes } from 'react';

/**
 * Dense figure tables: hairline rows, small caps-free headers, numbers right-aligned in the
 * monospaced face. `numeric` on a cell switches it to figures.
 */
export function Table({ children, className = '', caption }: { children: ReactNode; className?: string; caption?: ReactNode }) {
  return (
    <div className="overflow-x-auto rounded border border-rule bg-paper-raised">
      <table className={`w-full border-collapse text-sm ${className}`}>
        {caption && <caption className="sr-only">{caption}</caption>}
        {children}
      </table>
    </div>
  );
}

export function THead({ children }: { children: ReactNode }) {
  return <thead className="border-b border-rule-strong bg-paper-sunk/70 text-left">{children}</thead>;
}

export function TBody({ children }: { children: ReactNode }) {
  return <tbody className="[&>tr:nth-child(even)]:bg-paper/60 [&>tr]:border-b [&>tr]:border-rule/70 [&>tr:last-child]:border-0">{children}</tbody>;
}

export function Tr({ className = '', ...rest }: HTMLAttributes<HTMLTableRowElement>) {
  return <tr className={`hover:bg-accent-wash/40 ${className}`} {...rest} />;
}

export function Th({ numeric = false, className = '', ...rest }: ThHTMLAttributes<HTMLTableCellElement> & { numeric?: boolean }) {
  return (
    <th
      scope="col"
      className={`h-8 px-3 text-xs font-semibold whitespace-nowrap text-ink-soft ${numeric ? 'text-right' : 'text-left'} ${className}`}
      {...rest}
    />
  );
}

export function Td({ numeric = false, className = '', ...rest }: TdHTMLAttributes<HTMLTableCellElement> & { numeric?: boolean }) {
  return <td className={`h-8 px-3 py-1 align-middle ${numeric ? 'figures text-right' : ''} ${className}`} {...rest} />;
}
