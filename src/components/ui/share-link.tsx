import { useState } from 'react';
import { copyText } from '../../lib/copy-text.ts';
import { formatDateTime } from '../../lib/format.ts';
import { Button } from './button.tsx';

/**
 * The two halves of making a read-only link, the same for a setup revision and a study:
 * `MakeShareLink` picks an expiry and asks for the link; `FreshShareLink` shows the new link
 * once (the server keeps only a hash of its token) with a copy button.
 */

type Expiry = 'never' | '1' | '7' | '30' | 'date';

/** When the link stops working: an ISO time, null for "until withdrawn", 'invalid' for a bad date. */
function expiryOf(choice: Expiry, date: string): string | null | 'invalid' {
  if (choice === 'never') return null;
  if (choice === 'date') {
    const d = new Date(`${date}T23:59:59`);
    return Number.isNaN(d.getTime()) ? 'invalid' : d.toISOString();
  }
  return new Date(Date.now() + Number(choice) * 86_400_000).toISOString();
}

export interface MakeShareLinkProps {
  /** "revision 3", "this study". */
  what: string;
  busy: boolean;
  /** The server's refusal, if any. */
  error?: string;
  onMake: (expiresAt: string | null) => void;
}

export function MakeShareLink({ what, busy, error, onMake }: MakeShareLinkProps) {
  const [expiry, setExpiry] = useState<Expiry>('never');
  const [date, setDate] = useState('');
  const [own, setOwn] = useState('');
  const make = () => {
    const expiresAt = expiryOf(expiry, date);
    if (expiresAt === 'invalid') return setOwn('Pick the last day the link should work.');
    setOwn('');
    onMake(expiresAt);
  };
  const shown = own || error;
  return (
    <div className="flex flex-wrap items-center gap-2 text-sm">
      <span className="text-ink-soft">Share {what} read-only,</span>
      <select aria-label="Link expiry" value={expiry} onChange={(e) => setExpiry(e.target.value as Expiry)} className="h-8 rounded-sm border border-rule-strong bg-paper-raised px-1.5">
        <option value="never">until withdrawn</option>
        <option value="1">for 1 day</option>
        <option value="7">for 7 days</option>
        <option value="30">for 30 days</option>
        <option value="date">until a date…</option>
      </select>
      {expiry === 'date' && <input type="date" aria-label="Last day" value={date} onChange={(e) => setDate(e.target.value)} className="h-8 rounded-sm border border-rule-strong bg-paper-raised px-1.5" />}
      <Button variant="primary" size="sm" className="h-8" busy={busy} onClick={make}>
        Make read-only link
      </Button>
      {shown && (
        <span role="alert" className="text-sm text-danger">
          {shown}
        </span>
      )}
    </div>
  );
}

export interface FreshShareLinkProps {
  /** What the link opens, e.g. "Pipit front r3" or "the study Damper sweep". */
  label: string;
  /** `/shared/<token>` */
  path: string;
  expiresAt: string | null;
  onDone: () => void;
}

export function FreshShareLink({ label, path, expiresAt, onDone }: FreshShareLinkProps) {
  const url = `${window.location.origin}${path}`;
  const [copied, setCopied] = useState(false);
  return (
    <div role="status" className="mb-3 rounded border border-accent/40 bg-accent-wash/60 px-3 py-2">
      <p className="text-sm font-semibold text-accent-strong">Read-only link to {label}</p>
      <div className="mt-1.5 flex gap-2">
        <input aria-label="Share link" readOnly value={url} onFocus={(e) => e.target.select()} className="figures h-8 min-w-0 flex-1 rounded-sm border border-rule-strong bg-paper-raised px-2 text-xs" />
        <Button size="sm" className="h-8" onClick={() => void copyText(url).then(setCopied)}>
          {copied ? 'Copied' : 'Copy link'}
        </Button>
      </div>
      <p className="mt-1.5 text-xs text-ink-soft">
        Copy it now: it is shown only once. Anyone holding it can read it, signed in or not, until it {expiresAt ? `expires on ${formatDateTime(expiresAt)} or ` : ''}is withdrawn.{' '}
        <button type="button" className="text-accent underline" onClick={onDone}>
          Done
        </button>
      </p>
    </div>
  );
}
