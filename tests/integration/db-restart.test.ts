import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { answer, sleep, startRig, until, type Rig } from '../setup/fault-rig';
import { settle, writeEmails } from '../setup/mail-ledger';

// This file runs its own PostgreSQL and two app processes with workers on, so it can stop and freeze the database
// without touching the server the other test files share.
let rig: Rig;
beforeAll(async () => {
  rig = await startRig({ instances: 2, env: { DB_CONNECT_TIMEOUT_MS: '1000', DB_STATEMENT_TIMEOUT_MS: '2000' } });
}, 120_000);
afterAll(() => rig?.stop());

const emailLog = (i: Rig['instances'][number]) => answer(`${i.origin}/api/emails?limit=1`, i.cookie);

/** Asks every instance for the e-mail log (session, sign-in and a query) over and over until told to stop. */
function probeAll() {
  const statuses: number[] = [];
  let going = true;
  const done = (async () => {
    while (going) {
      statuses.push(...(await Promise.all(rig.instances.map(emailLog))));
      await sleep(50);
    }
  })();
  return {
    statuses,
    stop: async () => {
      going = false;
      await done;
      return statuses;
    },
  };
}

describe('PostgreSQL going away under two running instances', () => {
  it('keeps both alive, answers 503 while it is down, serves again by itself and sends every e-mail exactly once', async () => {
    // Replies held a little, so messages are with the mail server (claimed, not yet recorded) when the database goes.
    rig.standIns.mail.setReplyDelay(300);
    const probes = probeAll();
    const writing = writeEmails(rig.db, 40, 'restart', 50);
    await sleep(700);
    await rig.restartPostgres(2_000);
    const ids = [...(await writing), ...(await writeEmails(rig.db, 5, 'after the restart'))];
    await until('both instances to serve again', async () =>
      (await Promise.all(rig.instances.map(emailLog))).every((s) => s === 200),
    );
    const statuses = await probes.stop();
    const tally = await settle(rig.standIns.mail.webUrl, ids, 60_000);
    rig.standIns.mail.setReplyDelay(0);

    expect(rig.died()).toEqual([]);
    expect(tally).toEqual({ tried: 45, delivered: 45, lost: 0, doubled: 0 });
    expect(statuses).toContain(503);
    expect(statuses.filter((s) => s !== 200 && s !== 503)).toEqual([]);
  });

  it('answers 503 while the database is frozen instead of holding the request, and serves again when it thaws', async () => {
    const ids = await writeEmails(rig.db, 10, 'before the freeze');
    const frozen = rig.freezePostgres(12_000);
    await sleep(300);
    const during = await Promise.all(rig.instances.map(emailLog));
    await frozen;
    await until('both instances to serve again', async () =>
      (await Promise.all(rig.instances.map(emailLog))).every((s) => s === 200),
    );

    expect(during).toEqual([503, 503]);
    expect(rig.died()).toEqual([]);
    expect(await settle(rig.standIns.mail.webUrl, ids, 60_000)).toEqual({
      tried: 10,
      delivered: 10,
      lost: 0,
      doubled: 0,
    });
  });
});
