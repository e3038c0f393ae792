import { useEffect, useId } from 'react';
import { useBlocker } from 'react-router';
import { Button } from '../../../components/ui/button.tsx';

/**
 * Warns before edits are lost, valid or not: leaving for another page of the app opens our own
 * question over the page (React Router's blocker holds the navigation until it is answered);
 * closing or reloading the tab gets the browser's own question (`beforeunload`).
 */
export function UnsavedGuard({ when, invalid = false }: { when: boolean; invalid?: boolean }) {
  const titleId = useId();
  const blocker = useBlocker(({ currentLocation, nextLocation }) => when && currentLocation.pathname !== nextLocation.pathname);

  useEffect(() => {
    if (!when) return;
    const onUnload = (e: BeforeUnloadEvent) => {
      e.preventDefault();
      e.returnValue = '';
    };
    window.addEventListener('beforeunload', onUnload);
    return () => window.removeEventListener('beforeunload', onUnload);
  }, [when]);

  useEffect(() => {
    if (blocker.state === 'blocked' && !when) blocker.reset();
  }, [blocker, when]);

  useEffect(() => {
    if (blocker.state !== 'blocked') return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Escape') blocker.reset();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [blocker]);

  if (blocker.state !== 'blocked') return null;
  return (
    <div className="fixed inset-0 z-50 flex items-center justify-center bg-ink/30 px-4">
      <div role="alertdialog" aria-modal="true" aria-labelledby={titleId} className="w-full max-w-md rounded border-t-4 border-signal bg-paper-raised p-5 shadow-lift">
        <h2 id={titleId} className="text-base font-semibold text-ink">
          Leave without saving?
        </h2>
        <p className="mt-2 text-sm text-ink-soft">
          This setup has edits that are not saved as a revision{invalid ? ', some of them not valid yet' : ''}. Leaving this page throws them away.
        </p>
        <div className="mt-4 flex flex-wrap justify-end gap-2">
          <Button size="sm" variant="primary" onClick={() => blocker.reset()} autoFocus>
            Stay and keep editing
          </Button>
          <Button size="sm" variant="danger" onClick={() => blocker.proceed()}>
            Leave and lose the edits
          </Button>
        </div>
      </div>
    </div>
  );
}
