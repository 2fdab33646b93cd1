import { useEffect, useRef } from 'react';
import { useBlocker } from 'react-router-dom';
import { Button } from '@/components/ui/button';

/**
 * Holds in-app navigation while there are unsaved edits and asks first; closing or reloading the tab gets the
 * browser's own warning. Needs a data router (createBrowserRouter), which the app uses.
 */
export function UnsavedChangesGuard({ dirty }: { dirty: boolean }) {
  // Only a move to another page loses the draft; a changed query string on the same page keeps it.
  const blocker = useBlocker(({ currentLocation, nextLocation }) => dirty && currentLocation.pathname !== nextLocation.pathname);
  const dialog = useRef<HTMLDivElement>(null);

  useEffect(() => {
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => {
      e.preventDefault();
      // Older Chromium only shows the prompt when returnValue is set.
      e.returnValue = '';
    };
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  useEffect(() => {
    if (blocker.state === 'blocked') dialog.current?.focus();
  }, [blocker.state]);

  // Saved in the meantime (or the edits undone): nothing is lost any more, so let the move go on.
  useEffect(() => {
    if (blocker.state === 'blocked' && !dirty) blocker.proceed();
  }, [blocker, dirty]);

  if (blocker.state !== 'blocked') return null;
  return (
    <div className="fixed inset-0 z-50 flex items-center justify-center bg-ink/40 p-4">
      <div
        ref={dialog}
        tabIndex={-1}
        role="alertdialog"
        aria-modal="true"
        aria-labelledby="unsaved-title"
        aria-describedby="unsaved-text"
        className="w-full max-w-md rounded-lg border border-line bg-white p-5 shadow-lg"
      >
        <h2 id="unsaved-title">Leave without saving?</h2>
        <p id="unsaved-text" className="mt-2 text-sm">
          This scenario has changes that are not saved. If you leave now they are lost.
        </p>
        <div className="mt-4 flex flex-wrap justify-end gap-2">
          <Button variant="secondary" onClick={() => blocker.reset()}>
            Stay and keep editing
          </Button>
          <Button variant="danger" onClick={() => blocker.proceed()}>
            Leave without saving
          </Button>
        </div>
      </div>
    </div>
  );
}
