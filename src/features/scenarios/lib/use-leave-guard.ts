import { useEffect, useRef } from 'react';
import { useBlocker } from 'react-router-dom';

/**
 * Asks before leaving the page with unsaved edits: a confirm for links inside the app, the browser's own
 * prompt for closing or reloading the tab. Call `allowNextLeave()` just before navigating on purpose (after a save).
 */
export function useLeaveGuard(dirty: boolean): { allowNextLeave: () => void } {
  const allowed = useRef(false);
  const blocker = useBlocker(({ currentLocation, nextLocation }) => dirty && !allowed.current && currentLocation.pathname !== nextLocation.pathname);

  useEffect(() => {
    if (blocker.state !== 'blocked') return;
    if (window.confirm('This scenario has unsaved changes. Leave without saving them?')) blocker.proceed();
    else blocker.reset();
  }, [blocker]);

  useEffect(() => {
    // A save clears the form; the next edit must be guarded again.
    if (!dirty) {
      allowed.current = false;
      return;
    }
    const warn = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  return { allowNextLeave: () => (allowed.current = true) };
}
