import type { Db } from '../db/client';
import { renewLease, type Claim } from './email-claims';

/**
 * Keeps a claim alive while its message is with the mail server: renews the lease every third of its length and
 * aborts the send once the lease can no longer be trusted, either because another sender holds the row now or
 * because no renewal got through (the database is away) and the lease is about to run out. Aborting before the
 * lease ends is what keeps a second sender from sending the same row at the same time. The margin allows for the
 * time a renewal takes and for clocks that differ slightly between this machine and the database's.
 */
export function keepLease(db: Db, claim: Claim, leaseMs: number, claimedAt: number, abort: (reason: string) => void) {
  const margin = Math.max(200, leaseMs / 5);
  let validUntil = claimedAt + leaseMs - margin;
  let lastRenewal = claimedAt;
  let renewing = false;
  let stopped = false;
  const stop = () => {
    stopped = true;
    clearInterval(timer);
  };
  const lose = (reason: string) => {
    if (!stopped) {
      stop();
      abort(reason);
    }
  };
  const tick = () => {
    if (Date.now() >= validUntil) return lose('the lease could not be renewed in time');
    if (renewing || Date.now() - lastRenewal < leaseMs / 3) return;
    const started = Date.now();
    lastRenewal = started;
    renewing = true;
    renewLease(db, claim, leaseMs)
      .then(
        (ours) => {
          if (ours) validUntil = started + leaseMs - margin;
          else lose('another sender holds the row now');
        },
        () => undefined, // the database is away: the deadline above decides
      )
      .finally(() => {
        renewing = false;
      });
  };
  const timer = setInterval(tick, Math.max(50, Math.min(1_000, leaseMs / 10)));
  return { stop };
}
