import { useEffect, useRef } from 'react';
import { useBlocker } from 'react-router-dom';
import { Button } from '../../components/button';
import { Dialog } from '../../components/dialog';

/**
 * While the workbench holds unsaved inputs, leaving it asks first: another
 * page of the app opens a dialog (React Router's useBlocker), closing or
 * reloading the tab gets the browser's own question (beforeunload). A link
 * within the page (a trail step's #hash) and the navigation a save itself
 * makes (`saving`) pass.
 */
export function UnsavedChangesGuard({ dirty, saving }: { dirty: boolean; saving: boolean }) {
  const state = useRef({ dirty, saving });
  useEffect(() => {
    state.current = { dirty, saving };
  });
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) =>
      state.current.dirty &&
      !state.current.saving &&
      currentLocation.pathname !== nextLocation.pathname,
  );
  useEffect(() => {
    if (!dirty) return undefined;
    const ask = (event: BeforeUnloadEvent) => {
      event.preventDefault();
      // Older browsers ask only when returnValue is set.
      event.returnValue = '';
    };
    window.addEventListener('beforeunload', ask);
    return () => window.removeEventListener('beforeunload', ask);
  }, [dirty]);
  const blocked = blocker.state === 'blocked';
  return (
    <Dialog
      open={blocked}
      title="Leave without saving?"
      onClose={() => blocker.reset?.()}
      footer={
        <>
          <Button data-autofocus onClick={() => blocker.reset?.()}>
            Stay on this page
          </Button>
          <Button variant="danger" onClick={() => blocker.proceed?.()}>
            Leave and drop the changes
          </Button>
        </>
      }
    >
      <p className="text-sm">
        The inputs on this page have changed since they were last saved. Leave now and those changes
        are lost; stay, and save them as a revision first if you want to keep them.
      </p>
    </Dialog>
  );
}
