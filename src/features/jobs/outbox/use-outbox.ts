import { useCallback, useEffect, useRef, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { invalidateJob } from '../api/invalidate-job';
import { outboxDb, onOutboxChange } from './outbox-db';
import { sendItem } from './outbox-http';
import { drain, retryNow, type OutboxItem } from './outbox-queue';

/** This person's items still on the phone, kept current as they are added, sent or held (in every tab). */
export function useOutboxItems(userId: string | undefined) {
  const [items, setItems] = useState<OutboxItem[]>([]);
  useEffect(() => {
    if (!userId) return;
    let live = true;
    const read = () =>
      void outboxDb.all().then((all) => {
        if (live) setItems(all.filter((i) => i.userId === userId));
      });
    read();
    const stop = onOutboxChange(read);
    return () => {
      live = false;
      stop();
    };
  }, [userId]);
  return userId ? items : [];
}

let round: Promise<unknown> = Promise.resolve();
/** One round at a time in this tab; across tabs the Web Locks API takes turns (the keys make a double harmless). */
function sendRound(userId: string, onAnswered: (items: OutboxItem[]) => void) {
  round = round.then(async () => {
    const go = async () => {
      const { sent, held } = await drain(outboxDb, userId, sendItem);
      // Stored or refused, the server has news about the job (a refusal usually means its status moved).
      if (sent.length + held.length > 0) onAnswered([...sent, ...held]);
    };
    if (navigator.locks) await navigator.locks.request('gradepass-outbox', go);
    else await go();
  });
  return round;
}

/**
 * Sends the queue whenever it can: at start, when the browser says the connection is back, whenever something is
 * added, and every 15 seconds while anything waits. Mounted once in the app shell for a crew lead.
 */
export function useOutboxSender(userId: string | undefined) {
  const queryClient = useQueryClient();
  const onAnswered = useRef((answered: OutboxItem[]) => {
    for (const id of new Set(answered.map((i) => i.requestId))) void invalidateJob(queryClient, id);
  });
  useEffect(() => {
    if (!userId) return;
    const run = () => {
      if (navigator.onLine) void sendRound(userId, onAnswered.current);
    };
    // The connection is back: whatever was waiting for a later try is due now.
    const online = async () => {
      const now = Date.now();
      for (const item of await outboxDb.all()) {
        if (item.userId === userId && item.state === 'waiting' && item.nextTryAt > now) {
          await outboxDb.put({ ...item, nextTryAt: now });
        }
      }
      run();
    };
    run();
    const stopChanges = onOutboxChange(run);
    window.addEventListener('online', online);
    const timer = window.setInterval(run, 15_000);
    return () => {
      stopChanges();
      window.removeEventListener('online', online);
      window.clearInterval(timer);
    };
  }, [userId]);
}

/** The crew lead's own choices for a held item: send it again, or let it go for good. */
export function useOutboxActions() {
  const retry = useCallback((item: OutboxItem) => outboxDb.put(retryNow(item, Date.now())), []);
  const discard = useCallback((item: OutboxItem) => outboxDb.remove(item.key), []);
  return { retry, discard };
}

export const addToOutbox = (item: OutboxItem) => outboxDb.put(item);
