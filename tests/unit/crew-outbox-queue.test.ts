import { describe, expect, it } from 'vitest';
import { ApiError } from '../../src/lib/api-client';
import {
  StorageStepError,
  afterTry,
  backoffMs,
  drain,
  dueItems,
  outcomeOf,
  retryNow,
  summarize,
  type OutboxItem,
  type OutboxStore,
} from '../../src/features/jobs/outbox/outbox-queue';

const crew = 'crew-1';
let n = 0;
function readings(count: number, extra: Partial<OutboxItem> = {}): OutboxItem {
  n += 1;
  return {
    key: `key-${n}`,
    type: 'readings',
    body: { readings: Array.from({ length: count }, (_, i) => ({ stationFt: 5 + i * 10, gradePercent: 3 })) },
    userId: crew,
    requestId: 'job-1',
    jobReference: 'GP-2026-00016',
    createdAt: new Date(Date.UTC(2026, 11, 2, 12, 0, n)).toISOString(),
    state: 'waiting',
    attempts: 0,
    nextTryAt: 0,
    ...extra,
  } as OutboxItem;
}
function photo(extra: Partial<OutboxItem> = {}): OutboxItem {
  const base = readings(0, extra);
  return {
    ...base,
    type: 'photo',
    photo: {
      blob: new Blob(['x']),
      fileName: 'a.jpg',
      contentType: 'image/jpeg',
      sizeBytes: 1,
      kind: 'finished_entrance',
    },
  } as OutboxItem;
}
function memoryStore(items: OutboxItem[]): OutboxStore & { items: Map<string, OutboxItem> } {
  const map = new Map(items.map((i) => [i.key, i]));
  return {
    items: map,
    all: async () => [...map.values()],
    put: async (item) => void map.set(item.key, item),
    remove: async (key) => void map.delete(key),
  };
}

describe('what a failed try means', () => {
  it('no connection, a busy or failing server and a lapsed session wait and end the round', () => {
    expect(outcomeOf(new TypeError('Failed to fetch'))).toMatchObject({ kind: 'retry', stop: true });
    for (const status of [401, 408, 429, 500, 503]) {
      expect(outcomeOf(new ApiError(status, 'x', 'busy')), String(status)).toMatchObject({ kind: 'retry', stop: true });
    }
    expect(outcomeOf(new ApiError(401, 'unauthenticated', 'Please sign in first.'))).toMatchObject({
      problem: expect.stringMatching(/sign in again/),
    });
  });

  it('a refusal is held with the server’s own words; a photo missing from storage is simply sent again', () => {
    expect(outcomeOf(new ApiError(409, 'conflict', 'this one is "Built"'))).toEqual({
      kind: 'held',
      problem: 'this one is "Built"',
    });
    expect(outcomeOf(new ApiError(400, 'invalid_input', 'bad reading'))).toMatchObject({ kind: 'held' });
    expect(outcomeOf(new ApiError(404, 'not_found', 'Job was not found.'))).toMatchObject({ kind: 'held' });
    expect(outcomeOf(new StorageStepError('not in storage'))).toMatchObject({ kind: 'retry', stop: false });
  });

  it('waits 5 s, then twice as long each time, never more than 5 minutes', () => {
    expect([1, 2, 3, 4].map(backoffMs)).toEqual([5_000, 10_000, 20_000, 40_000]);
    expect(backoffMs(30)).toBe(300_000);
    const item = readings(1);
    const later = afterTry(item, { kind: 'retry', problem: 'No connection', stop: true }, 1_000)!;
    expect(later).toMatchObject({ state: 'waiting', attempts: 1, nextTryAt: 6_000, problem: 'No connection' });
    expect(afterTry(item, { kind: 'sent' }, 1_000)).toBeNull();
    const held = afterTry(item, { kind: 'held', problem: 'refused' }, 1_000)!;
    expect(held).toMatchObject({ state: 'held', problem: 'refused' });
    expect(retryNow(held, 9_000)).toMatchObject({ state: 'waiting', nextTryAt: 9_000, key: item.key });
  });
});

describe('a round of sending', () => {
  it('sends the due items of this person only, oldest first, each under its own key', async () => {
    const first = readings(2);
    const second = photo();
    const notDue = readings(1, { nextTryAt: 50_000 });
    const someoneElse = readings(1, { userId: 'crew-2' });
    const held = readings(1, { state: 'held' });
    const store = memoryStore([second, notDue, someoneElse, held, first]);
    const sentKeys: string[] = [];
    const result = await drain(
      store,
      crew,
      async (i) => void sentKeys.push(i.key),
      () => 10_000,
    );
    expect(sentKeys).toEqual([first.key, second.key]);
    expect(result.sent.map((i) => i.key)).toEqual([first.key, second.key]);
    expect([...store.items.keys()].sort()).toEqual([notDue.key, someoneElse.key, held.key].sort());
    expect(dueItems([...store.items.values()], crew, 10_000)).toEqual([]);
  });

  it('stops at the first try with no connection and keeps everything', async () => {
    const items = [readings(1), readings(1), photo()];
    const store = memoryStore(items);
    let tries = 0;
    const result = await drain(
      store,
      crew,
      async () => {
        tries += 1;
        throw new TypeError('Failed to fetch');
      },
      () => 0,
    );
    expect(tries).toBe(1);
    expect(result.stoppedEarly).toBe(true);
    expect(store.items.size).toBe(3);
    expect(store.items.get(items[0].key)).toMatchObject({ attempts: 1, nextTryAt: 5_000 });
  });

  it('holds a refused item and goes on with the rest: nothing is lost', async () => {
    const refused = readings(3);
    const fine = photo();
    const store = memoryStore([refused, fine]);
    const result = await drain(
      store,
      crew,
      async (i) => {
        if (i.key === refused.key) throw new ApiError(409, 'conflict', 'this one is "Built"');
      },
      () => 0,
    );
    expect(result.held.map((i) => i.key)).toEqual([refused.key]);
    expect([...store.items.values()]).toEqual([
      { ...refused, state: 'held', attempts: 1, problem: 'this one is "Built"' },
    ]);
  });
});

describe('the words on screen', () => {
  it('counts readings one by one and photos, waiting apart from held', () => {
    expect(summarize([readings(2), readings(1), photo(), photo()])).toEqual({
      waiting: '3 readings, 2 photos',
      held: null,
    });
    expect(summarize([readings(1), photo({ state: 'held' })])).toEqual({ waiting: '1 reading', held: '1 photo' });
    expect(summarize([])).toEqual({ waiting: null, held: null });
  });
});
