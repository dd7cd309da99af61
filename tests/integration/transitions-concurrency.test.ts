import { and, eq, ne } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { emails, requestEvents, requests } from '../../server/db/schema';
import { type Cast, withCastApp } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import type { TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
withCastApp((app, signedIn) => {
  t = app;
  cast = signedIn;
});

describe('two office people changing one request at once', () => {
  it.each([1, 2, 3, 4, 5])(
    'exactly one wins, the other gets 409, one event and one e-mail are written (round %i)',
    async () => {
      const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id });
      const [a, b] = await Promise.all([
        cast.staff.agent.post(`/api/requests/${row.id}/transitions`).send({
          action: 'ask-details',
          note: 'Which side of the mailbox should the entrance go?',
          expectedVersion: row.version,
        }),
        cast.otherStaff.agent.post(`/api/requests/${row.id}/transitions`).send({
          action: 'book-visit',
          visitAt: new Date(Date.now() + 2 * 86_400_000).toISOString(),
          expectedVersion: row.version,
        }),
      ]);
      expect([a.status, b.status].sort()).toEqual([200, 409]);
      const loser = a.status === 409 ? a : b;
      expect(loser.body.error.message).toMatch(/"More details needed"|"Site visit booked"|version/);

      const [after] = await t.ctx.db.select().from(requests).where(eq(requests.id, row.id));
      expect(after.version).toBe(row.version + 1);
      const events = await t.ctx.db
        .select()
        .from(requestEvents)
        .where(and(eq(requestEvents.requestId, row.id), ne(requestEvents.fromStatus, 'draft')));
      expect(events).toHaveLength(1);
      expect(events[0].toStatus).toBe(after.status);
      const mail = await t.ctx.db.select().from(emails).where(eq(emails.requestId, row.id));
      expect(mail).toHaveLength(1);
    },
  );

  it('refuses a stale version with 409 and writes nothing', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id });
    await cast.staff.agent
      .post(`/api/requests/${row.id}/transitions`)
      .send({ action: 'ask-details', note: 'Is the ditch on your side of the road?', expectedVersion: row.version })
      .expect(200);
    await cast.applicant.agent
      .post(`/api/requests/${row.id}/transitions`)
      .send({ action: 'answer', answer: 'Yes, on our side.', expectedVersion: row.version + 1 })
      .expect(200);
    const stale = await cast.otherStaff.agent
      .post(`/api/requests/${row.id}/transitions`)
      .send({ action: 'decline', note: 'Too close to the bend.', expectedVersion: row.version + 1 })
      .expect(409);
    expect(stale.body.error.message).toContain('version');
    expect(stale.body.error.message).toContain('"Sent to the office"');
    expect(stale.body.error.message).not.toContain('submitted)');
    const [after] = await t.ctx.db.select().from(requests).where(eq(requests.id, row.id));
    expect(after).toMatchObject({ status: 'submitted', version: row.version + 2 });
    expect(await t.ctx.db.select().from(emails).where(eq(emails.requestId, row.id))).toHaveLength(2);
  });
});
