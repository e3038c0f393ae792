import { Fragment } from 'react';

const URL_RE = /(https?:\/\/[^\s<>"]+)/g;

/** A plain-text e-mail body with its links clickable; the text itself is never parsed as HTML. */
export function MessageText({ text }: { text: string }) {
  const parts = text.split(URL_RE);
  return (
    <pre className="font-sans text-base leading-relaxed whitespace-pre-wrap text-ink">
      {parts.map((part, i) =>
        i % 2 === 1 ? (
          <a key={i} href={part} className="break-all text-accent underline decoration-accent/40 underline-offset-2 hover:decoration-accent">
            {part}
          </a>
        ) : (
          <Fragment key={i}>{part}</Fragment>
        ),
      )}
    </pre>
  );
}
