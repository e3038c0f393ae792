import { createContext, useCallback, useContext, useEffect, useMemo, useState, type ReactNode } from 'react';

type Tone = 'ok' | 'danger' | 'info';
interface ToastItem {
  id: number;
  tone: Tone;
  text: string;
}

interface ToastApi {
  /** Show a short message in the corner for a few seconds. Use for results of an action, not for errors a form can show itself. */
  show: (text: string, tone?: Tone) => void;
}

const ToastContext = createContext<ToastApi | null>(null);

const toneClass: Record<Tone, string> = {
  ok: 'border-l-ok',
  danger: 'border-l-danger',
  info: 'border-l-accent',
};

function ToastCard({ item, onDone }: { item: ToastItem; onDone: (id: number) => void }) {
  useEffect(() => {
    const timer = window.setTimeout(() => onDone(item.id), 4500);
    return () => window.clearTimeout(timer);
  }, [item.id, onDone]);
  return (
    <li className={`pointer-events-auto flex items-start gap-3 rounded border border-rule border-l-4 bg-paper-raised px-3 py-2 text-sm shadow-lift ${toneClass[item.tone]}`}>
      <span className="min-w-0 flex-1 [overflow-wrap:anywhere]">{item.text}</span>
      <button type="button" onClick={() => onDone(item.id)} className="text-ink-faint hover:text-ink" aria-label="Dismiss">
        ×
      </button>
    </li>
  );
}

export function ToastProvider({ children }: { children: ReactNode }) {
  const [items, setItems] = useState<ToastItem[]>([]);
  const remove = useCallback((id: number) => setItems((all) => all.filter((t) => t.id !== id)), []);
  const api = useMemo<ToastApi>(
    () => ({ show: (text, tone = 'ok') => setItems((all) => [...all.slice(-3), { id: Date.now() + Math.random(), tone, text }]) }),
    [],
  );
  return (
    <ToastContext.Provider value={api}>
      {children}
      <ol aria-live="polite" className="pointer-events-none fixed right-4 bottom-4 z-50 flex w-80 flex-col gap-2">
        {items.map((item) => (
          <ToastCard key={item.id} item={item} onDone={remove} />
        ))}
      </ol>
    </ToastContext.Provider>
  );
}

export function useToast(): ToastApi {
  const api = useContext(ToastContext);
  if (!api) throw new Error('useToast outside ToastProvider');
  return api;
}
