import { openDB, type DBSchema, type IDBPDatabase } from 'idb';
import type { OutboxItem, OutboxStore } from './outbox-queue';

/** The send queue in IndexedDB (through `idb`): it outlives a reload, a closed tab and a phone restart. */
interface FieldDb extends DBSchema {
  outbox: { key: string; value: OutboxItem };
}

let opened: Promise<IDBPDatabase<FieldDb>> | undefined;
const database = () =>
  (opened ??= openDB<FieldDb>('gradepass-field', 1, {
    upgrade(db) {
      db.createObjectStore('outbox', { keyPath: 'key' });
    },
  }));

// Every change is announced in this tab and the others, so each "waiting to send" line shows the same count.
const changes = new EventTarget();
const otherTabs = typeof BroadcastChannel === 'function' ? new BroadcastChannel('gradepass-outbox') : undefined;
otherTabs?.addEventListener('message', () => changes.dispatchEvent(new Event('change')));
function announce() {
  changes.dispatchEvent(new Event('change'));
  otherTabs?.postMessage('change');
}

export function onOutboxChange(listener: () => void) {
  changes.addEventListener('change', listener);
  return () => changes.removeEventListener('change', listener);
}

export const outboxDb: OutboxStore = {
  all: async () => (await database()).getAll('outbox'),
  put: async (item) => {
    await (await database()).put('outbox', item);
    announce();
  },
  remove: async (key) => {
    await (await database()).delete('outbox', key);
    announce();
  },
};
