import { randomUUID } from 'node:crypto';
import type request from 'supertest';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { ensurePerson } from '../factories/people';
import { completeApplication } from '../factories/request-rows';
import { signIn, type TestApp } from '../setup/test-app';

export type Agent = ReturnType<typeof request.agent>;

/** A brand-new homeowner, signed in through the OAuth round trip. */
export const newApplicant = (t: TestApp, label = 'owner') =>
  signIn(t.app, `${label}-${randomUUID().slice(0, 8)}@example.test`);

/** A draft filled in through the API the wizard uses, ready to submit. */
export async function completedDraft(agent: Agent) {
  const created = await agent.post('/api/requests').send({}).expect(201);
  const { site, entrance } = completeApplication();
  const saved = await agent
    .patch(`/api/requests/${created.body.request.id}/draft`)
    .send({ expectedVersion: created.body.request.version, wizardStep: 3, site, entrance })
    .expect(200);
  return saved.body.request as { id: string; version: number; reference: string; status: string };
}

export async function submitted(agent: Agent) {
  const draft = await completedDraft(agent);
  const res = await agent
    .post(`/api/requests/${draft.id}/transitions`)
    .send({ action: 'submit', expectedVersion: draft.version })
    .expect(200);
  return res.body.request as { id: string; version: number; reference: string; status: string };
}

/** One of the demo office or crew people, made known to this test database first so their role holds. */
export async function signInDemo(t: TestApp, email: string) {
  const person = demoPeople.find((p) => p.email === email);
  if (!person) throw new Error(`${email} is not a demo person`);
  await ensurePerson(t.ctx.db, person);
  return signIn(t.app, email);
}
