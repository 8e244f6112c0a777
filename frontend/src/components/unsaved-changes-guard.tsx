import { useEffect } from 'react';
import { useBlocker } from 'react-router-dom';
import { ConfirmDialog } from './confirm-dialog';

/**
 * Asks before unsaved edits are lost: a dialog when the user follows a link, a breadcrumb or Back
 * to another page (React Router's blocker; the app uses a data router), and the browser's own
 * question on reload or closing the tab (`beforeunload`).
 */
export function UnsavedChangesGuard({
  dirty,
  what = 'this house',
  offerAlternative = true,
}: {
  dirty: boolean;
  what?: string;
  /** whether the page can keep the edits as an alternative (a house not yet created cannot) */
  offerAlternative?: boolean;
}) {
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) =>
      dirty && (currentLocation.pathname !== nextLocation.pathname || currentLocation.search !== nextLocation.search),
  );
  useEffect(() => {
    if (!dirty) return;
    const onBeforeUnload = (event: BeforeUnloadEvent) => {
      event.preventDefault();
      // Older browsers show the prompt only when returnValue is set.
      event.returnValue = '';
    };
    window.addEventListener('beforeunload', onBeforeUnload);
    return () => window.removeEventListener('beforeunload', onBeforeUnload);
  }, [dirty]);
  // Nothing to ask any more (saved meanwhile): let a blocked move go on.
  useEffect(() => {
    if (blocker.state === 'blocked' && !dirty) blocker.proceed();
  }, [blocker, dirty]);

  return (
    <ConfirmDialog
      open={blocker.state === 'blocked'}
      title="Leave without saving?"
      message={`Your edits to ${what} are not saved. Leave this page and lose them, or stay to save them${offerAlternative ? ' (or save them as an alternative)' : ''}.`}
      confirmLabel="Leave and lose edits"
      onClose={() => blocker.reset?.()}
      onConfirm={() => blocker.proceed?.()}
    />
  );
}
