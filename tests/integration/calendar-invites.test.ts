import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { StandIns, StoredMessage } from '../../fakes';
import { emails, jobs } from '../../server/db/schema';
import { startWorkers, type Workers } from '../../server/workers';
import { signInCast, type Cast } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import { startOwnStandIns, type OwnStandIns } from '../setup/own-stand-ins';
import { createTestApp, type TestApp } from '../setup/test-app';

// Its own mail catcher, so the messages read here are this file's alone.
let own: OwnStandIns;
let standIns: StandIns;
let t: TestApp;
let cast: Cast;
let workers: Workers;
const fast = {
  delivery: { leaseMs: 2_000, firstDelayMs: 300, maxDelayMs: 1_000, horizonMs: 60_000 },
  sweepIntervalMs: 200,
  pollingIntervalSeconds: 0.5,
};

beforeAll(async () => {
  own = await startOwnStandIns('calendar');
  standIns = own.standIns;
  t = await createTestApp(own.smtpEnv);
  cast = await signInCast(t);
  workers = await startWorkers(t.ctx, { email: fast });
});
afterAll(async () => {
  await workers?.stop();
  await t?.close();
  await own?.stop();
});

/** The invitation's lines, unfolded as RFC 5545 says (a line starting with a space continues the one before). */
function icsFields(text: string) {
  const lines = text.replace(/\r?\n[ \t]/g, '').split(/\r?\n/);
  const field = (name: string) =>
    lines.find((l) => l.startsWith(`${name}:`) || l.startsWith(`${name};`))?.replace(/^[^:]*:/, '');
  return {
    method: field('METHOD'),
    uid: field('UID'),
    sequence: Number(field('SEQUENCE')),
    status: field('STATUS'),
    dtstart: lines.find((l) => l.startsWith('DTSTART')),
    summary: field('SUMMARY'),
  };
}

async function mailTo(address: string, subjectPart: RegExp, count: number): Promise<StoredMessage[]> {
  const end = Date.now() + 20_000;
  for (;;) {
    const all = (await (await fetch(`${standIns.mail.webUrl}/api/messages`)).json()) as StoredMessage[];
    const found = all.filter((m) => m.to.includes(address) && subjectPart.test(m.subject + m.text));
    if (found.length >= count) return found;
    if (Date.now() > end) throw new Error(`timed out waiting for ${count} message(s) to ${address}`);
    await new Promise((r) => setTimeout(r, 150));
  }
}
const invite = (m: StoredMessage) => {
  const files = m.attachments.filter((a) => a.contentType.startsWith('text/calendar'));
  expect(files).toHaveLength(1);
  return icsFields(files[0].text ?? '');
};

describe('calendar invitations with the owner’s e-mails', () => {
  it('books, moves and calls off the visit with one invitation id and a rising SEQUENCE', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'submitted' });
    const go = async (body: Record<string, unknown>, version: number) =>
      (
        await cast.staff.agent
          .post(`/api/requests/${row.id}/transitions`)
          .send({ ...body, expectedVersion: version })
          .expect(200)
      ).body.request.version as number;
    const first = new Date(Date.now() + 3 * 86_400_000);
    first.setUTCHours(14, 30, 0, 0);
    let v = await go({ action: 'book-visit', visitAt: first.toISOString() }, row.version);
    const [booked] = await mailTo(cast.applicant.email, new RegExp(row.reference), 1);
    const one = invite(booked);
    expect(one).toMatchObject({ method: 'REQUEST', uid: `visit-${row.id}@gradepass`, sequence: 0 });
    expect(one.dtstart).toContain(first.toISOString().replace(/[-:]/g, '').slice(0, 13));
    expect(booked.text).toMatch(/Site visit: [A-Z][a-z]{2} \d{1,2}, \d{4} at \d{1,2}:\d{2} [AP]M/);

    const moved = new Date(first.getTime() + 86_400_000);
    v = await go({ action: 'reschedule-visit', visitAt: moved.toISOString(), note: 'The road crew is there.' }, v);
    const afterMove = await mailTo(cast.applicant.email, new RegExp(row.reference), 2);
    const two = invite(afterMove[1]);
    expect(two).toMatchObject({ method: 'REQUEST', uid: one.uid, sequence: 1 });
    expect(two.dtstart).toContain(moved.toISOString().replace(/[-:]/g, '').slice(0, 13));
    expect(afterMove[1].text).toMatch(/moves to/);

    await go({ action: 'cancel-visit' }, v);
    const afterCancel = await mailTo(cast.applicant.email, new RegExp(row.reference), 3);
    const three = invite(afterCancel[2]);
    expect(three).toMatchObject({ method: 'CANCEL', uid: one.uid, sequence: 2, status: 'CANCELLED' });
    const request = (await cast.staff.agent.get(`/api/requests/${row.id}`).expect(200)).body.request;
    expect(request).toMatchObject({ status: 'submitted', visitAt: null });
  });

  it('sends the crew’s work day as an all-day invitation, updated when the day moves; the retry keeps the file', async () => {
    const row = await createRequestRow(t.ctx.db, {
      applicantId: cast.applicant.id,
      status: 'crew_assigned',
      crewId: cast.crew.id,
    });
    await t.ctx.db.update(jobs).set({ crewId: cast.crew.id }).where(eq(jobs.requestId, row.id));
    const day = (n: number) => new Date(Date.now() + n * 86_400_000).toISOString().slice(0, 10);
    const plan = (date: string) => cast.crew.agent.post(`/api/crew/jobs/${row.id}/schedule`).send({ date }).expect(200);
    await plan(day(5));
    await plan(day(6));
    const sent = await mailTo(cast.applicant.email, new RegExp(`${row.reference}: work planned`), 2);
    // Delivered by the background sender, not necessarily in the order written: read them in SEQUENCE order.
    const [a, b] = sent.map(invite).sort((x, y) => x.sequence - y.sequence);
    expect(a).toMatchObject({ method: 'REQUEST', uid: `work-day-${row.id}@gradepass`, sequence: 0 });
    expect(a.dtstart).toBe(`DTSTART;VALUE=DATE:${day(5).replace(/-/g, '')}`);
    expect(b).toMatchObject({ uid: a.uid, sequence: 1 });
    expect(b.dtstart).toBe(`DTSTART;VALUE=DATE:${day(6).replace(/-/g, '')}`);
    // The invitation is stored with the outbox row, so a retry or a resend sends the very same file.
    const rows = await t.ctx.db.select().from(emails).where(eq(emails.requestId, row.id));
    const ownerRows = rows.filter((r) => r.toAddress === cast.applicant.email);
    expect(ownerRows.every((r) => r.attachments.length === 1)).toBe(true);
    expect(rows.filter((r) => r.toAddress !== cast.applicant.email).every((r) => r.attachments.length === 0)).toBe(
      true,
    );
  });
});
