import { createContext, useContext, useId, type InputHTMLAttributes, type ReactNode, type Ref, type SelectHTMLAttributes, type TextareaHTMLAttributes } from 'react';

interface FieldIds {
  controlId: string;
  messageId: string;
  invalid: boolean;
}

const FieldContext = createContext<FieldIds | null>(null);

export interface FieldProps {
  label: ReactNode;
  /** Problem with the current value, shown beside the control and read with it. */
  error?: string;
  /** Short help shown when there is no error. */
  hint?: ReactNode;
  /** `inline` puts label, control and message on one row (dense forms); `stacked` for narrow ones. */
  layout?: 'stacked' | 'inline';
  children: ReactNode;
  className?: string;
}

/** Label + control + message. The control inside picks up its id and ARIA wiring from here. */
export function Field({ label, error, hint, layout = 'stacked', children, className = '' }: FieldProps) {
  const id = useId();
  const ids: FieldIds = { controlId: `${id}-control`, messageId: `${id}-message`, invalid: Boolean(error) };
  const message = error ? (
    <p id={ids.messageId} className="text-sm text-danger" role="alert">
      {error}
    </p>
  ) : hint ? (
    <p id={ids.messageId} className="text-xs text-ink-faint">
      {hint}
    </p>
  ) : null;

  return (
    <FieldContext.Provider value={ids}>
      {layout === 'inline' ? (
        <div className={`grid grid-cols-[minmax(8rem,12rem)_minmax(8rem,16rem)_1fr] items-center gap-x-3 gap-y-1 ${className}`}>
          <label htmlFor={ids.controlId} className="text-sm text-ink-soft">
            {label}
          </label>
          <div>{children}</div>
          <div className="min-w-0">{message}</div>
        </div>
      ) : (
        <div className={`flex flex-col gap-1 ${className}`}>
          <label htmlFor={ids.controlId} className="text-sm font-medium text-ink-soft">
            {label}
          </label>
          {children}
          {message}
        </div>
      )}
    </FieldContext.Provider>
  );
}

const controlClass =
  'w-full rounded border bg-paper-raised px-2.5 text-base text-ink placeholder:text-ink-faint/70 ' +
  'transition-colors hover:border-ink-faint focus-visible:border-accent focus-visible:outline-offset-0 ' +
  'disabled:bg-paper-sunk disabled:text-ink-faint';

function useFieldProps(id?: string) {
  const field = useContext(FieldContext);
  const invalid = field?.invalid ?? false;
  return {
    id: id ?? field?.controlId,
    'aria-invalid': invalid || undefined,
    'aria-describedby': field?.messageId,
    border: invalid ? 'border-danger' : 'border-rule-strong',
  };
}

export function Input({ className = '', id, ref, ...rest }: InputHTMLAttributes<HTMLInputElement> & { ref?: Ref<HTMLInputElement> }) {
  const { border, ...aria } = useFieldProps(id);
  return <input ref={ref} className={`${controlClass} ${border} h-9 ${className}`} {...aria} {...rest} />;
}

export function Select({ className = '', id, ref, children, ...rest }: SelectHTMLAttributes<HTMLSelectElement> & { ref?: Ref<HTMLSelectElement> }) {
  const { border, ...aria } = useFieldProps(id);
  return (
    <select ref={ref} className={`${controlClass} ${border} h-9 pr-7 ${className}`} {...aria} {...rest}>
      {children}
    </select>
  );
}

/** A multi-line text box, labelled by its `Field` like `Input` and `Select`. */
export function Textarea({ className = '', id, ref, ...rest }: TextareaHTMLAttributes<HTMLTextAreaElement> & { ref?: Ref<HTMLTextAreaElement> }) {
  const { border, ...aria } = useFieldProps(id);
  return <textarea ref={ref} className={`${controlClass} ${border} py-1.5 text-sm ${className}`} {...aria} {...rest} />;
}

/** An error that belongs to the whole form, not one field. */
export function FormError({ message }: { message?: string }) {
  if (!message) return null;
  return (
    <p role="alert" className="rounded border border-danger/30 bg-danger-wash px-3 py-2 text-sm text-danger">
      {message}
    </p>
  );
}
