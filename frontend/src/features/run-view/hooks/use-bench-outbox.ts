import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useRef, useState } from 'react';

import type { Session } from '@tracewright/shared';

import { runViewKeys } from '../api/run-view-keys';
import { sendWrite } from '../api/send-write';
import { createOutbox, type Outbox } from '../outbox/outbox-engine';
import type { OutboxItem } from '../outbox/outbox-types';
import { benchStore } from '../storage/bench-store-instance';
import { alarmAcks } from '../utils/alarm-acks';

/**
 * The page's outbox: loaded from the tablet's store on arrival (or handed the writes the loader read), sent whenever the network comes
 * back or the page is shown again, and the run refetched after each round that sent something.
 */
export function useBenchOutbox(user: Session['user'], initialItems: OutboxItem[] | null = null): Outbox {
  const queryClient = useQueryClient();
  const userRef = useRef(user);
  useEffect(() => {
    userRef.current = user;
  }, [user]);

  const [outbox] = useState(() =>
    createOutbox({
      store: benchStore(),
      send: sendWrite,
      currentUser: () => ({ id: userRef.current.id, name: userRef.current.name }),
      onSent: (item) => {
        if (item.kind === 'start-timer' && item.resultId !== null) alarmAcks.alias(item.id, `srv:${item.resultId}`);
      },
      onRoundSent: () => void queryClient.invalidateQueries({ queryKey: runViewKeys.all }),
      initialItems,
    }),
  );

  useEffect(() => {
    void outbox.drain();
    const onOnline = () => outbox.retryNow();
    const onVisible = () => {
      if (document.visibilityState === 'visible') outbox.retryNow();
    };
    window.addEventListener('online', onOnline);
    document.addEventListener('visibilitychange', onVisible);
    return () => {
      window.removeEventListener('online', onOnline);
      document.removeEventListener('visibilitychange', onVisible);
      outbox.dispose();
    };
  }, [outbox]);

  // A new person on this tablet (PIN switch) may be the one whose writes are waiting.
  useEffect(() => {
    void outbox.drain();
  }, [outbox, user.id]);

  return outbox;
}
