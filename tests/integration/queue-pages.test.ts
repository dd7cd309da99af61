import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import type { AppContext } from '../../server/config/context';
import { parseEnv } from '../../server/config/env';
import { closeContext, createContext } from '../../server/context-factory';
import { changeNoticesApplication } from '../../server/infra/change-notices';
import { createJurisdiction } from '../factories/grade-checks';
import { signInCast, type Cast } from '../factories/office-cast';
import { createRequestRow, type RequestRow } from '../factories/request-rows';
import { statementsDuring } from '../setup/statements';
import { createTestApp, signIn, type TestApp } from '../setup/test-app';

// Pages of the office queue kept between reads (server/services/queue/queue-pages.ts): answered again without the
// database while nothing shown has changed, and never after a change has been announced or made here.
let t: TestApp;
let cast: Cast;
let secondCtx: AppContext;
let secondStaff: Awaited<ReturnType<typeof signIn>>;
let rows: RequestRow[];
let place: string;

beforeAll(async () => {
  t = await createTestApp();
  cast = await signInCast(t);
  // A second instance on the same database, as behind a load balancer.
  secondCtx = createContext(parseEnv(t.env));
  secondStaff = await signIn(createApp(secondCtx), cast.staff.email);
  place = (await createJurisdiction(t.ctx.db, { name: 'Harrowgate Township' })).jurisdiction.id;
  rows = [];
  for (const [i, road] of ['Alder Wash Road', 'Birchmoor Lane', 'Cobble Fen Road'].entries()) {
    rows.push(
      await createRequestRow(t.ctx.db, {
        applicantId: cast.applicant.id,
        roadName: road,
        applicantName: `Queue Reader ${i}`,
        jurisdictionId: place,
        statusChangedAt: new Date(Date.UTC(2026, 5, 1, 9, i)),
      }),
    );
  }
});
afterAll(async () => {
  await closeContext(secondCtx);
  await t.close();
});

type Page = { requests: { id: string; roadName: string; status: string; assignee: { name: string } | null }[] };
const view = `/api/queue?jurisdiction=`;
const read = async (agent = cast.staff.agent) =>
  (await agent.get(`${view}${place}&sort=road`).expect(200)).body as Page;
const rowOf = (page: Page, id: string) => page.requests.find((r) => r.id === id);

async function until(what: string, check: () => Promise<boolean> | boolean, ms = 5_000) {
  const end = Date.now() + ms;
  while (!(await check())) {
    if (Date.now() > end) throw new Error(`still not ${what} after ${ms} ms`);
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
}

describe('queue pages kept between reads', () => {
  it('answer a view read again with no statement but the session’s', async () => {
    await read();
    await until('listening', () => t.ctx.queueChanges.listening);
    const first = await read();
    let again: Page | undefined;
    const sent = await statementsDuring(t.ctx.pool, async () => (again = await read()));
    expect(again).toEqual(first);
    expect(sent, sent.join('\n')).toHaveLength(1);
    expect(sent[0]).toMatch(/session/);
  });

  it('show a change made through this instance on the very next read', async () => {
    const [row] = rows;
    expect(rowOf(await read(), row.id)?.assignee).toBeNull();
    await cast.staff.agent.put(`/api/requests/${row.id}/assignee`).send({ assigneeId: cast.otherStaff.id }).expect(200);
    expect(rowOf(await read(), row.id)?.assignee).not.toBeNull();
  });

  it('show a change made through another instance, or straight in the database, once PostgreSQL announces it', async () => {
    const [, row, third] = rows;
    await read();
    await secondStaff.put(`/api/requests/${row.id}/assignee`).send({ assigneeId: cast.staff.id }).expect(200);
    await until('showing the other instance’s change', async () => rowOf(await read(), row.id)?.assignee !== null);
    // A worker or an administrator writing directly, with no request through any app at all.
    await t.ctx.pool.query(`update requests set road_name = 'Cobble Fen Road East' where id = $1`, [third.id]);
    await until(
      'showing the direct change',
      async () => rowOf(await read(), third.id)?.roadName.endsWith('East') === true,
    );
    // Names shown in a row change with the person and the authority they come from.
    await t.ctx.pool.query(`update users set name = 'Renamed Assignee' where id = $1`, [cast.staff.id]);
    await until('showing the new name', async () => rowOf(await read(), row.id)?.assignee?.name === 'Renamed Assignee');
  });

  it('build every page afresh while notices are not arriving, and keep pages again once they are', async () => {
    const [, , third] = rows;
    await until('listening', () => t.ctx.queueChanges.listening);
    await read();
    // An administrator ends the listening connections (a restart or a failover does the same).
    await t.ctx.pool.query('select pg_terminate_backend(pid) from pg_stat_activity where application_name = $1', [
      changeNoticesApplication,
    ]);
    await until('deaf', () => !t.ctx.queueChanges.listening);
    // Nobody hears this change's notice; the page must show it all the same.
    await t.ctx.pool.query(`update requests set road_name = 'Cobble Fen Road West' where id = $1`, [third.id]);
    expect(rowOf(await read(), third.id)?.roadName).toBe('Cobble Fen Road West');
    await until('listening again', () => t.ctx.queueChanges.listening);
    await read();
    const sent = await statementsDuring(t.ctx.pool, () => read());
    expect(sent).toHaveLength(1);
  });

  it('keep each person’s "assigned to me" apart, and are never shown to other roles', async () => {
    const [first] = rows;
    const mine = (agent: typeof cast.staff.agent) =>
      agent.get('/api/queue?assignee=me').expect(200) as Promise<{ body: Page }>;
    const other = (await mine(cast.otherStaff.agent)).body.requests.map((r) => r.id);
    const own = (await mine(cast.staff.agent)).body.requests.map((r) => r.id);
    expect(other).toContain(first.id);
    expect(own).not.toContain(first.id);
    expect((await mine(cast.otherStaff.agent)).body.requests.map((r) => r.id)).toEqual(other);
    await cast.applicant.agent.get(`${view}${place}&sort=road`).expect(403);
    await cast.crew.agent.get('/api/queue?assignee=me').expect(403);
  });
});

describe('what PostgreSQL announces', () => {
  it('every change a queue row can show, and nothing for a draft’s own edits', async () => {
    const listener = new pg.Client({ connectionString: t.databaseUrl });
    await listener.connect();
    let heard = 0;
    listener.on('notification', () => heard++);
    await listener.query('listen queue_changed');
    const settle = () => new Promise((resolve) => setTimeout(resolve, 300));
    try {
      const draft = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'draft' });
      await t.ctx.pool.query(`update requests set road_name = 'Still Typing Lane', wizard_step = 2 where id = $1`, [
        draft.id,
      ]);
      await settle();
      expect(heard).toBe(0);
      // Submitting it puts it in the queue.
      await t.ctx.pool.query(`update requests set status = 'submitted' where id = $1`, [draft.id]);
      await settle();
      expect(heard).toBe(1);
      // Columns no row shows stay quiet; the ones it shows, filters on or sorts by do not.
      await t.ctx.pool.query(`update requests set wizard_step = 3 where id = $1`, [draft.id]);
      await settle();
      expect(heard).toBe(1);
      await t.ctx.pool.query(`update jurisdictions set name = 'Harrowgate Township (North)' where id = $1`, [place]);
      await settle();
      expect(heard).toBe(2);
      // Many rows in one transaction are one notice.
      await t.ctx.pool.query(`update requests set status_changed_at = status_changed_at where jurisdiction_id = $1`, [
        place,
      ]);
      await settle();
      expect(heard).toBe(3);
    } finally {
      await listener.end();
    }
  });
});
