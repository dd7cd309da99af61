import type { SaveAsBuiltInput } from '@shared/crew/crew-inputs';
import type { CrewPhotoKind } from '@shared/contracts/crew-photos';
import { ApiError } from '@/lib/api-client';

/**
 * The crew's send queue: what was entered on the phone and not yet stored by the server. Each item carries the
 * idempotency key it was made with, and keeps it for every try, so the server stores it once however often it is
 * sent. This file is the queue's logic with no browser storage in it (the store is `outbox-db.ts`), so the unit
 * tests can drive it.
 */
interface ItemBase {
  /** The idempotency key, made on the phone when the item was entered; also the item's id in the store. */
  key: string;
  /** Who entered it: only that person's session sends it. */
  userId: string;
  requestId: string;
  jobReference: string;
  createdAt: string;
  /** waiting: will be sent when it can; held: the server refused it, and only the crew lead decides what next. */
  state: 'waiting' | 'held';
  attempts: number;
  /** Epoch milliseconds of the next try while waiting. */
  nextTryAt: number;
  /** Why the last try did not store it, in plain words (no connection, signed out, what the server said). */
  problem?: string;
}

export interface PhotoPayload {
  blob: Blob;
  fileName: string;
  contentType: string;
  sizeBytes: number;
  kind: CrewPhotoKind;
  caption?: string;
  gpsLat?: number;
  gpsLng?: number;
}

export type OutboxItem =
  (ItemBase & { type: 'readings'; body: SaveAsBuiltInput }) | (ItemBase & { type: 'photo'; photo: PhotoPayload });

export type Outcome =
  | { kind: 'sent' }
  /** Try again later by itself: no connection, the server busy or down, the session to be renewed. */
  | { kind: 'retry'; problem: string; stop: boolean }
  /** The server refused it for a reason another try will not change: keep it and tell the crew lead. */
  | { kind: 'held'; problem: string };

/** The step of a photo's sending that failed: a confirm that finds no bytes in storage sends them again. */
export class StorageStepError extends Error {}

const minute = 60_000;

/** Waits between tries: 5 s, 10 s, 20 s … at most 5 minutes. */
export function backoffMs(attempts: number) {
  return Math.min(5_000 * 2 ** Math.max(0, attempts - 1), 5 * minute);
}

/** What a failed try means for the item. */
export function outcomeOf(error: unknown): Outcome {
  if (error instanceof StorageStepError) return { kind: 'retry', problem: error.message, stop: false };
  if (!(error instanceof ApiError)) {
    // fetch rejects with a TypeError when there is no connection at all.
    return { kind: 'retry', problem: 'No connection to the server yet.', stop: true };
  }
  if (error.status === 401) {
    return { kind: 'retry', problem: 'Signed out: sign in again and it will be sent.', stop: true };
  }
  if (error.status === 408 || error.status === 429 || error.status >= 500) {
    return { kind: 'retry', problem: `The server could not take it just now (${error.message})`, stop: true };
  }
  return { kind: 'held', problem: error.message };
}

/** The item after a try: null when it was stored (it leaves the queue). */
export function afterTry(item: OutboxItem, outcome: Outcome, now: number): OutboxItem | null {
  if (outcome.kind === 'sent') return null;
  const attempts = item.attempts + 1;
  if (outcome.kind === 'held') return { ...item, state: 'held', attempts, problem: outcome.problem };
  return { ...item, state: 'waiting', attempts, problem: outcome.problem, nextTryAt: now + backoffMs(attempts) };
}

/** The crew lead chose to send a held item again: it waits to be sent at once. */
export const retryNow = (item: OutboxItem, now: number): OutboxItem => ({ ...item, state: 'waiting', nextTryAt: now });

export function dueItems(items: OutboxItem[], userId: string, now: number) {
  return items
    .filter((i) => i.userId === userId && i.state === 'waiting' && i.nextTryAt <= now)
    .sort((a, b) => (a.createdAt < b.createdAt ? -1 : a.createdAt > b.createdAt ? 1 : 0));
}

export interface OutboxStore {
  all(): Promise<OutboxItem[]>;
  put(item: OutboxItem): Promise<void>;
  remove(key: string): Promise<void>;
}

export interface DrainResult {
  sent: OutboxItem[];
  held: OutboxItem[];
  stoppedEarly: boolean;
}

/**
 * Sends every item that is due, oldest first, one at a time (readings taken in order are stored in order). A try
 * that finds no connection ends the round: the rest would only fail the same way.
 */
export async function drain(
  store: OutboxStore,
  userId: string,
  send: (item: OutboxItem) => Promise<void>,
  now: () => number = Date.now,
): Promise<DrainResult> {
  const result: DrainResult = { sent: [], held: [], stoppedEarly: false };
  for (const item of dueItems(await store.all(), userId, now())) {
    let outcome: Outcome;
    try {
      await send(item);
      outcome = { kind: 'sent' };
    } catch (error) {
      outcome = outcomeOf(error);
    }
    const next = afterTry(item, outcome, now());
    if (next) await store.put(next);
    else await store.remove(item.key);
    if (outcome.kind === 'sent') result.sent.push(item);
    if (outcome.kind === 'held') result.held.push(next!);
    if (outcome.kind === 'retry' && outcome.stop) {
      result.stoppedEarly = true;
      break;
    }
  }
  return result;
}

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** "Waiting to send: 3 readings, 2 photos" for what is still on this phone, held items counted apart. */
export function summarize(items: OutboxItem[]) {
  const count = (state: OutboxItem['state']) => {
    const of = items.filter((i) => i.state === state);
    const readings = of.reduce((n, i) => n + (i.type === 'readings' ? i.body.readings.length : 0), 0);
    const photos = of.filter((i) => i.type === 'photo').length;
    const parts = [
      readings > 0 && plural(readings, 'reading', 'readings'),
      photos > 0 && plural(photos, 'photo', 'photos'),
    ].filter(Boolean);
    return parts.length > 0 ? parts.join(', ') : null;
  };
  return { waiting: count('waiting'), held: count('held') };
}
