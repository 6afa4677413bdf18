import { useEffect, useRef, useState } from 'react';

/**
 * A sentence for the live region whenever the number of blocked checks changes (not on first
 * show: the panel itself says it then), so a screen-reader user hears an edit's effect.
 */
export function useBlockedAnnouncement(blocked: number): string {
  const [message, setMessage] = useState('');
  const previous = useRef(blocked);
  useEffect(() => {
    if (previous.current === blocked) return;
    previous.current = blocked;
    if (blocked === 0) setMessage('No check blocks this version now.');
    else setMessage(`${blocked} ${blocked === 1 ? 'check blocks' : 'checks block'} this version now.`);
  }, [blocked]);
  return message;
}
