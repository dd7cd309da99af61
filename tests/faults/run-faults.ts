// `npm run faults`: repeats the bad days of issue 12 on this machine and prints what happened to the mail and the
// instances. A script, not a test: figures are printed, never asserted. Sizes and times can be changed through
// FAULT_* variables (see below).
import { eq, inArray } from 'drizzle-orm';
import { emails } from '../../server/db/schema';
import { answer, sleep, startRig, until, type Rig } from '../setup/fault-rig';
import { settle, writeEmails, type Tally } from '../setup/mail-ledger';

const n = (name: string, fallback: number) => Number(process.env[name] ?? fallback);
const count = n('FAULT_EMAILS', 30);
const freezeSeconds = n('FAULT_FREEZE_SECONDS', 15);
const slowReplySeconds = n('FAULT_SLOW_REPLY_SECONDS', 6);
const smtpDownSeconds = n('FAULT_SMTP_DOWN_SECONDS', 30);
// A short lease and retry clock, so each fault takes seconds, not the minutes the defaults would.
const clock = {
  EMAIL_LEASE_SECONDS: '5',
  EMAIL_RETRY_FIRST_DELAY_SECONDS: '0.5',
  EMAIL_RETRY_MAX_DELAY_SECONDS: '2',
  EMAIL_RETRY_HORIZON_SECONDS: '3600',
};

interface Row extends Tally {
  fault: string;
  died: number;
  note: string;
}
const rows: Row[] = [];

/** Asks every live instance for the e-mail log over and over, keeping each answer's status and time. */
function probe(rig: Rig) {
  const seen: { status: number; ms: number }[] = [];
  let going = true;
  const done = (async () => {
    while (going) {
      await Promise.all(
        rig.instances
          .filter((i) => !i.killed)
          .map(async (i) => {
            const started = Date.now();
            seen.push({ status: await answer(`${i.origin}/api/emails?limit=1`, i.cookie), ms: Date.now() - started });
          }),
      );
      await sleep(100);
    }
  })();
  return async () => {
    going = false;
    await done;
    const by = (s: number) => seen.filter((x) => x.status === s).length;
    const other = seen.length - by(200) - by(503);
    return `${seen.length} requests: ${by(200)} ok, ${by(503)} answered 503, ${other} other; slowest answer ${Math.max(0, ...seen.map((x) => x.ms))} ms`;
  };
}

/**
 * Waits for the first instance to answer the office again. If it never does, says what it answered meanwhile
 * (0: nothing within 20 s), so a run that stops here can be read.
 */
async function serviceBack(rig: Rig, timeoutMs = 30_000) {
  const answered = new Map<number, number>();
  try {
    await until(
      'service to return',
      async () => {
        const status = await answer(`${rig.instances[0].origin}/api/emails?limit=1`, rig.instances[0].cookie);
        answered.set(status, (answered.get(status) ?? 0) + 1);
        return status === 200;
      },
      timeoutMs,
    );
  } catch (error) {
    const seen = [...answered].map(([status, times]) => `${status} x${times}`).join(', ');
    throw new Error(`${(error as Error).message}; the first instance answered ${seen}`);
  }
}

/** The road of one request as an instance's office queue shows it (null when it is not listed). */
async function queueRoad(instance: Rig['instances'][number], id: string): Promise<string | null> {
  const res = await fetch(`${instance.origin}/api/queue?limit=100`, { headers: { cookie: instance.cookie } });
  if (!res.ok) return null;
  const page = (await res.json()) as { requests: { id: string; roadName: string }[] };
  return page.requests.find((r) => r.id === id)?.roadName ?? null;
}

async function fault(
  rig: Rig,
  name: string,
  run: () => Promise<{ ids: string[]; note?: string }>,
  timeoutMs = 180_000,
) {
  process.stdout.write(`- ${name}... `);
  const diedBefore = rig.died().length;
  const started = Date.now();
  const { ids, note = '' } = await run();
  const tally = await settle(rig.standIns.mail.webUrl, ids, timeoutMs, 3_000);
  rig.standIns.mail.setReplyDelay(0);
  const row = {
    fault: name,
    ...tally,
    died: rig.died().length - diedBefore,
    note: `${note}${note ? '; ' : ''}all out ${((Date.now() - started) / 1000).toFixed(0)} s after the start`,
  };
  rows.push(row);
  console.log(`tried ${row.tried}, lost ${row.lost}, doubled ${row.doubled}, died ${row.died}`);
}

async function main() {
  console.log(
    `Starting PostgreSQL, the stand-ins and two app instances with workers on (lease ${clock.EMAIL_LEASE_SECONDS} s)...`,
  );
  const rig = await startRig({ instances: 2, env: clock });
  // Ctrl-C stops what the rig started (PostgreSQL, the stand-ins, the instances) before leaving.
  for (const signal of ['SIGINT', 'SIGTERM'] as const)
    process.once(signal, () => void rig.stop().finally(() => process.exit(130)));
  try {
    await fault(rig, `PostgreSQL frozen (SIGSTOP) for ${freezeSeconds} s`, async () => {
      rig.standIns.mail.setReplyDelay(300);
      const ids = await writeEmails(rig.db, count, 'freeze');
      const report = probe(rig);
      await rig.freezePostgres(freezeSeconds * 1000);
      const thawed = Date.now();
      await serviceBack(rig, 180_000);
      return {
        ids,
        note: `${await report()}; serving again ${((Date.now() - thawed) / 1000).toFixed(1)} s after the thaw`,
      };
    });

    await fault(rig, 'PostgreSQL restarted (down 2 s) under two instances', async () => {
      rig.standIns.mail.setReplyDelay(300);
      // A request in the office queue, read (and so kept) by both instances before the restart.
      const [{ id: moving }] = (
        await rig.pool.query(
          `insert into requests (reference, applicant_id, status, road_name, applicant_name)
           select 'GP-FAULT-00001', id, 'submitted', 'Before Restart Road', 'Fault Owner' from users limit 1
           returning id`,
        )
      ).rows as { id: string }[];
      for (const instance of rig.instances) await queueRoad(instance, moving);
      const report = probe(rig);
      const writing = writeEmails(rig.db, count, 'restart', 50);
      await sleep(1_000);
      await rig.restartPostgres(2_000);
      const ids = await writing;
      await serviceBack(rig);
      // Changed once the database is back: each instance's queue must show it, whether or not its notices resumed.
      await rig.pool.query(`update requests set road_name = 'After Restart Road' where id = $1`, [moving]);
      const changed = Date.now();
      let stale = 0;
      await until('both queues to show the change', async () => {
        const roads = await Promise.all(rig.instances.map((i) => queueRoad(i, moving)));
        stale += roads.filter((r) => r !== 'After Restart Road').length;
        return roads.every((r) => r === 'After Restart Road');
      });
      const shown = `the queue showed a change made after the restart on both instances in ${Date.now() - changed} ms (${stale} reads behind)`;
      return { ids, note: `${await report()}; ${shown}` };
    });

    await fault(
      rig,
      `SMTP slow (every reply held ${slowReplySeconds} s, lease ${clock.EMAIL_LEASE_SECONDS} s)`,
      async () => {
        rig.standIns.mail.setReplyDelay(slowReplySeconds * 1000);
        return { ids: await writeEmails(rig.db, count, 'slow') };
      },
      600_000,
    );

    await fault(rig, `SMTP down ${smtpDownSeconds} s (past the old 7 tries)`, async () => {
      await rig.standIns.mail.stopSmtp();
      const ids = await writeEmails(rig.db, count, 'smtp down');
      await sleep(smtpDownSeconds * 1000);
      const tries = await rig.db
        .select({ attempts: emails.attempts, status: emails.status })
        .from(emails)
        .where(inArray(emails.id, ids));
      await rig.standIns.mail.startSmtp();
      const fewest = Math.min(...tries.map((r) => r.attempts));
      return {
        ids,
        note: `each tried at least ${fewest} times while down, ${tries.filter((r) => r.status === 'dead').length} dead`,
      };
    });

    await fault(rig, 'a worker killed (SIGKILL) mid-send', async () => {
      rig.standIns.mail.setReplyDelay(1_000);
      const ids = await writeEmails(rig.db, count, 'kill');
      await until(
        'messages with the mail server',
        async () =>
          (await rig.db.select({ id: emails.id }).from(emails).where(eq(emails.status, 'sending'))).length >= 4,
      );
      const victim = rig.instances[0];
      victim.killed = true;
      victim.child.kill('SIGKILL');
      const killedAt = Date.now();
      await until(
        "the victim's rows to be sent",
        async () =>
          (
            await rig.db
              .select({ id: emails.id })
              .from(emails)
              .where(inArray(emails.status, ['sending', 'queued', 'failed']))
          ).length === 0,
        120_000,
      );
      return { ids, note: `every row sent ${((Date.now() - killedAt) / 1000).toFixed(1)} s after the kill` };
    });
  } finally {
    await rig.stop();
  }
  console.log('\nfault'.padEnd(58), 'tried'.padStart(6), 'lost'.padStart(5), 'doubled'.padStart(8), 'died'.padStart(5));
  for (const r of rows)
    console.log(
      r.fault.padEnd(57),
      String(r.tried).padStart(6),
      String(r.lost).padStart(5),
      String(r.doubled).padStart(8),
      String(r.died).padStart(5),
    );
  console.log('');
  for (const r of rows) console.log(`${r.fault}: ${r.note}`);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
