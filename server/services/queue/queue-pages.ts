import { LRUCache } from 'lru-cache';
import type { QueuePage, QueueQuery } from '@shared/contracts/queue';
import type { ChangeStamps } from '../../config/context';

/** At most this many pages, this much text, and this old: a bound even if a notice were ever missed. */
const maxPages = 500;
const maxChars = 8_000_000;
const maxAgeMs = 10_000;

/**
 * Queue pages as sent (JSON text), kept in this process while nothing they show has changed. An office reads the
 * same few views over and over between changes, and answering one of those again from here costs a request only its
 * session and sign-in. Whether anything changed is told by `ChangeNotices` (PostgreSQL's notices on commit, plus
 * the writes this process answers), so a change made through any instance is seen on the next read after it is
 * announced, and one made here on the very next read. While notices are not arriving, every page is built afresh.
 */
export class QueuePages {
  readonly #pages = new LRUCache<string, { stamp: number; body: string }>({
    max: maxPages,
    maxSize: maxChars,
    sizeCalculation: (page) => Math.max(1, page.body.length),
    ttl: maxAgeMs,
  });

  constructor(private readonly changes: ChangeStamps) {}

  /**
   * The page for `query` as JSON text: kept, or built by `build`. `assignee` is the query's "me" made a person's id,
   * the only thing in a page that depends on who asks (every office role sees the same rows).
   */
  async page(query: QueueQuery, assignee: string | undefined, build: () => Promise<QueuePage>): Promise<string> {
    const key = JSON.stringify([query, assignee]);
    // Read before building: a change announced while the page is built moves the stamp, and the page is not kept.
    const stamp = this.changes.stamp();
    const kept = stamp === null ? undefined : this.#pages.get(key);
    if (kept && kept.stamp === stamp) return kept.body;
    const body = JSON.stringify(await build());
    if (stamp !== null && this.changes.stamp() === stamp) this.#pages.set(key, { stamp, body });
    return body;
  }
}
