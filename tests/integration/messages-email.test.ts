import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { emails, requests } from '../../server/db/schema';
import { createTestApp, type TestApp } from '../setup/test-app';
import { newApplicant, signInDemo, submitted, type Agent } from './requests-helpers';

let t: TestApp;
let owner: Agent;
let ownerEmail: string;
let staff: Agent;
let crew: Agent;
let crewId: string;
beforeAll(async () => {
  t = await createTestApp();
  owner = await newApplicant(t);
  ownerEmail = (await owner.get('/api/me').expect(200)).body.user.email;
  staff = await signInDemo(t, 'marcus.bell@gradepass.test');
  crew = await signInDemo(t, 'jo.haverford@gradepass.test');
  crewId = (await crew.get('/api/me').expect(200)).body.user.id;
});
afterAll(() => t.close());

const messageMail = (requestId: string) =>
  t.ctx.db
    .select()
    .from(emails)
    .where(and(eq(emails.requestId, requestId), eq(emails.template, 'message.shared')));
const post = (agent: Agent, requestId: string, body: string, visibility?: 'internal' | 'shared') =>
  agent
    .post(`/api/requests/${requestId}/messages`)
    .send({ body, ...(visibility ? { visibility } : {}) })
    .expect(201);

describe('e-mail about new messages', () => {
  it('tells the homeowner about a shared message and nobody about an internal note', async () => {
    const sent = await submitted(owner);
    await post(staff, sent.id, 'Pins look disturbed; re-shoot the centreline.', 'internal');
    await post(staff, sent.id, 'Default visibility is internal too.');
    expect(await messageMail(sent.id)).toEqual([]);

    await post(staff, sent.id, 'Could you mark the corner pin with a flag before Thursday?', 'shared');
    const [mail, ...more] = await messageMail(sent.id);
    expect(more).toEqual([]);
    expect(mail.toAddress).toBe(ownerEmail);
    expect(mail.subject).toBe(`${sent.reference}: a message from the office`);
    expect(mail.textBody).toContain('Could you mark the corner pin with a flag before Thursday?');
    expect(mail.textBody).toContain(`${t.env.APP_ORIGIN}/my/requests/${sent.id}`);
    for (const text of [mail.textBody, mail.htmlBody]) expect(text).not.toContain('Pins look disturbed');
  });

  it('tells the office inbox when the homeowner writes, and not the owner', async () => {
    const sent = await submitted(owner);
    await post(owner, sent.id, 'The flag is on the pin & the gate is open.');
    const mail = await messageMail(sent.id);
    expect(mail.map((m) => m.toAddress)).toEqual([t.env.OFFICE_EMAIL]);
    expect(mail[0].subject).toMatch(new RegExp(`^\\[${sent.reference}\\] Message from `));
    expect(mail[0].textBody).toContain(`${t.env.APP_ORIGIN}/office/requests/${sent.id}`);
    expect(mail[0].htmlBody).toContain('the pin &amp; the gate');
  });

  it('copies the crew lead holding the job, and tells the others when the crew writes', async () => {
    const sent = await submitted(owner);
    await t.ctx.db.update(requests).set({ status: 'crew_assigned', crewId }).where(eq(requests.id, sent.id));
    await post(owner, sent.id, 'Please keep off the septic lid on the left.');
    await post(crew, sent.id, 'We will start at 7 with a flagger on the road.');
    await post(staff, sent.id, 'Permit card is in the mailbox.', 'shared');
    const crewEmail = (await crew.get('/api/me')).body.user.email;
    const heard = (await messageMail(sent.id)).map((m) => {
      const said = ['septic lid', 'flagger', 'Permit card'].find((words) => m.textBody.includes(words));
      return `${said} -> ${m.toAddress}${m.textBody.includes(`/crew/jobs/${sent.id}/`) ? ' (job link)' : ''}`;
    });
    expect(heard.sort()).toEqual(
      [
        `Permit card -> ${crewEmail} (job link)`,
        `Permit card -> ${ownerEmail}`,
        `flagger -> ${ownerEmail}`,
        `flagger -> ${t.env.OFFICE_EMAIL}`,
        `septic lid -> ${crewEmail} (job link)`,
        `septic lid -> ${t.env.OFFICE_EMAIL}`,
      ].sort(),
    );
  });

  it('writes no e-mail when the message is refused', async () => {
    const { id } = (await owner.post('/api/requests').send({}).expect(201)).body.request;
    await owner.post(`/api/requests/${id}/messages`).send({ body: 'Hello?' }).expect(409);
    await owner.post(`/api/requests/${id}/messages`).send({ body: '' }).expect(400);
    expect(await messageMail(id)).toEqual([]);
  });
});
