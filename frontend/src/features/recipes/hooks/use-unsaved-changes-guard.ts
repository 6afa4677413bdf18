import { useEffect } from 'react';
import { useBlocker } from 'react-router';

/**
 * Unsaved edits are not lost by accident: an in-app navigation waits for the person's answer
 * (the returned blocker), and closing or reloading the tab asks the browser's own question.
 */
export function useUnsavedChangesGuard(isDirty: boolean) {
  const blocker = useBlocker(({ currentLocation, nextLocation }) => isDirty && currentLocation.pathname !== nextLocation.pathname);
  useEffect(() => {
    if (!isDirty) return undefined;
    const onBeforeUnload = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener('beforeunload', onBeforeUnload);
    return () => window.removeEventListener('beforeunload', onBeforeUnload);
  }, [isDirty]);
  return blocker;
}
