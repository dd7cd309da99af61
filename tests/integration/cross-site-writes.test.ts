import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { seedDemo } from '../../server/dev/seed';
import { createTestApp, signIn, type TestApp } from '../setup/test-app';

let t: TestApp;
let appOrigin: URL;
beforeAll(async () => {
  t = await createTestApp();
  appOrigin = new URL(t.env.APP_ORIGIN);
  await seedDemo(t.ctx.db);
});
afterAll(() => t.close());

const person = (role: string) => demoPeople.find((p) => p.role === role)!.email;

describe('changes sent from another site', () => {
  it('are refused with 403, with or without a body, from another site or another port of this host', async () => {
    const applicant = await signIn(t.app, person('applicant'));
    const otherPort = `${appOrigin.protocol}//${appOrigin.hostname}:${Number(appOrigin.port) + 1}`;
    for (const origin of ['https://pages.example.test', otherPort, 'null']) {
      const draft = await applicant.post('/api/requests').set('Origin', origin).expect(403);
      expect(draft.body.error.message).toMatch(/another site/);
      await applicant.post('/auth/sign-out').set('Origin', origin).expect(403);
      await applicant
        .patch('/api/requests/00000000-0000-4000-8000-000000000000/draft')
        .set('Origin', origin)
        .send({ expectedVersion: 1 })
        .expect(403);
    }
    await applicant.get('/api/me').expect(200);
    const { rows } = await t.ctx.pool.query("select count(*)::int as n from requests where application = '{}'::jsonb");
    expect(rows[0].n).toBe(0);
  });

  it('are refused when only Fetch Metadata says the page was on another site', async () => {
    const applicant = await signIn(t.app, person('applicant'));
    await applicant.post('/api/requests').set('Sec-Fetch-Site', 'same-site').expect(403);
    await applicant.post('/api/requests').set('Sec-Fetch-Site', 'cross-site').expect(403);
  });

  it('are accepted from the app itself', async () => {
    const applicant = await signIn(t.app, person('applicant'));
    await applicant
      .post('/api/requests')
      .set('Origin', appOrigin.origin)
      .set('Sec-Fetch-Site', 'same-origin')
      .expect(201);
    await applicant.post('/auth/sign-out').set('Origin', appOrigin.origin).expect(204);
  });

  it('do not affect reading', async () => {
    const staff = await signIn(t.app, person('staff'));
    await staff.get('/api/me').set('Origin', 'https://pages.example.test').expect(200);
  });
});
