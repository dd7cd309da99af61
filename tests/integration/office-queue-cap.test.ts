import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { requests } from '../../server/db/schema';
import { queueCountCap } from '../../server/services/queue/queue-statement';
import { signInCast, type Cast } from '../factories/office-cast';
import { createTestApp, type TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
const many = queueCountCap + 25;
beforeAll(async () => {
  t = await createTestApp();
  cast = await signInCast(t);
  await t.ctx.db.insert(requests).values(
    Array.from({ length: many }, (_, i) => ({
      reference: `GP-2026-${String(i + 1).padStart(5, '0')}`,
      applicantId: cast.applicant.id,
      status: 'submitted' as const,
      applicantName: 'Ada Quill',
      siteAddress: `${i} Heron Bend Lane`,
      roadName: 'Otter Brook Road',
    })),
  );
});
afterAll(() => t.close());

describe('a big view of the queue', () => {
  it('counts up to the cap on the first page and not at all on later ones, while paging reaches every row', async () => {
    const first = await cast.staff.agent.get('/api/queue?limit=100').expect(200);
    expect(first.body).toMatchObject({ total: queueCountCap, totalIsCapped: true });
    let cursor = first.body.nextCursor;
    let seen = first.body.requests.length;
    while (cursor) {
      const next = await cast.staff.agent.get(`/api/queue?limit=100&cursor=${cursor}`).expect(200);
      expect(next.body).toMatchObject({ total: null, totalIsCapped: false });
      seen += next.body.requests.length;
      cursor = next.body.nextCursor;
    }
    expect(seen).toBe(many);
    const few = await cast.staff.agent.get('/api/queue?q=GP-2026-00007').expect(200);
    expect(few.body).toMatchObject({ total: 1, totalIsCapped: false });
  });
});
