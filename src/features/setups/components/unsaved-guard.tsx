import { useEffect } from 'react';
import { useBlocker } from 'react-router';
import { Button } from '../../../components/ui/button.tsx';

/**
 * Warns before unsaved changes are lost: leaving for another page of the app asks in a bar at
 * the foot of the page; closing or reloading the tab gets the browser's own question.
 */
export function UnsavedGuard({ when }: { when: boolean }) {
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

  if (blocker.state !== 'blocked') return null;
  return (
    <div role="alertdialog" aria-label="Unsaved changes" className="fixed inset-x-0 bottom-0 z-40 border-t-2 border-signal bg-signal-wash px-6 py-3 shadow-lift">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-3">
        <p className="text-sm text-signal-ink">This setup has changes that are not saved as a revision. Leave and lose them?</p>
        <div className="flex gap-2">
          <Button size="sm" onClick={() => blocker.reset()} autoFocus>
            Stay and keep editing
          </Button>
          <Button size="sm" variant="danger" onClick={() => blocker.proceed()}>
            Leave without saving
          </Button>
        </div>
      </div>
    </div>
  );
}
