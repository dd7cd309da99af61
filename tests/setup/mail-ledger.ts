import type { StoredMessage } from '../../fakes';
import type { Db } from '../../server/db/client';
import { isDatabaseUnavailable } from '../../server/lib/db-unavailable';
import { enqueueEmails } from '../../server/services/email/outbox';
import { sleep } from './fault-rig';

/** What reached the mail catcher, by outbox row id (the app puts it in a header of every message). */
export async function caughtById(mailWebUrl: string) {
  const messages = (await (await fetch(`${mailWebUrl}/api/messages`)).json()) as StoredMessage[];
  const copies = new Map<string, number>();
  for (const m of messages) {
    const id = m.headers['x-gradepass-email-id'];
    if (id) copies.set(id, (copies.get(id) ?? 0) + 1);
  }
  return copies;
}

/**
 * Writes `count` outbox rows as a status change would, one by one, retrying a write the database refused (as a
 * person would retry after a 503). Only rows whose write was confirmed count as tried.
 */
export async function writeEmails(db: Db, count: number, tag: string, gapMs = 0) {
  const ids: string[] = [];
  for (let i = 0; i < count; i += 1) {
    for (;;) {
      try {
        const [row] = await enqueueEmails(db, [
          {
            to: `owner-${i}@example.test`,
            template: 'fault-check',
            subject: `${tag} ${i + 1}`,
            text: `Message ${i + 1} of ${count}.`,
            html: `<p>Message ${i + 1} of ${count}.</p>`,
          },
        ]);
        ids.push(row.id);
        break;
      } catch (error) {
        if (!isDatabaseUnavailable(error)) throw error;
        await sleep(100);
      }
    }
    if (gapMs) await sleep(gapMs);
  }
  return ids;
}

export interface Tally {
  tried: number;
  delivered: number;
  lost: number;
  doubled: number;
}

/** Waits until every row has reached the catcher (or the time is up), then a little longer for any late double. */
export async function settle(mailWebUrl: string, ids: string[], timeoutMs: number, graceMs = 2_000): Promise<Tally> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const copies = await caughtById(mailWebUrl);
    if (ids.every((id) => copies.has(id)) || Date.now() > end) break;
    await sleep(250);
  }
  await sleep(graceMs);
  const copies = await caughtById(mailWebUrl);
  const delivered = ids.filter((id) => copies.has(id)).length;
  const doubled = ids.reduce((n, id) => n + Math.max(0, (copies.get(id) ?? 0) - 1), 0);
  return { tried: ids.length, delivered, lost: ids.length - delivered, doubled };
}
