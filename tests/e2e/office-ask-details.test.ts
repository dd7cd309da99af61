import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { StoredMessage } from '../../fakes';
import { createDb } from '../../server/db/client';
import { requests, users } from '../../server/db/schema';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { createRequestRow, type RequestRow } from '../factories/request-rows';
import { appUrl, caughtMail, launchBrowser, saveScreenshot, signInAs } from '../setup/browser';

const staff = demoPeople.find((p) => p.role === 'staff')!;
const owner = demoPeople.find((p) => p.role === 'applicant')!;
const question = 'Is the culvert under your current driveway 12 in or 15 in across?';

let session: Awaited<ReturnType<typeof launchBrowser>>;
let seeded: ReturnType<typeof createDb>;
let request: RequestRow;

beforeAll(async () => {
  session = await launchBrowser();
  seeded = createDb(inject('stack').adminDatabaseUrl.replace(/\/postgres$/, '/gradepass_e2e'), { max: 2 });
  const [applicant] = await seeded.db.select().from(users).where(eq(users.email, owner.email));
  request = await createRequestRow(seeded.db, {
    applicantId: applicant.id,
    applicantName: owner.name,
    siteAddress: '7 Wren Hollow Road, Fenwick Falls',
  });
});
afterAll(async () => {
  await session?.close();
  await seeded?.pool.end();
});

async function mailFor(reference: string, to: string): Promise<StoredMessage | undefined> {
  return (await caughtMail()).find((m) => m.subject.includes(reference) && m.to.includes(to));
}

const shot = saveScreenshot;

describe('the office asks for details and the owner answers', () => {
  it('works end to end through the queue, the workspace, the e-mail and the owner’s page', async () => {
    const office = await (await session.browser.newContext()).newPage();
    await signInAs(office, staff.email);
    await office.goto(appUrl('/office/queue'));
    await office.getByRole('button', { name: 'Sent to the office', exact: true }).click();
    await office.waitForURL((url) => url.searchParams.get('status') === 'submitted');
    const link = office.getByRole('link', { name: request.reference });
    await link.waitFor();
    // The previous page stays on screen until the filtered one arrives, so wait for the filter to take effect.
    await expect.poll(() => office.getByRole('row').filter({ hasText: 'More details needed' }).count()).toBe(0);
    await shot(office, 'office-queue-submitted');

    await link.click();
    await office.getByRole('heading', { name: request.reference }).waitFor();
    await office.getByRole('button', { name: 'Ask for details' }).click();
    await office.getByLabel('Questions for the homeowner').fill(question);
    await office
      .getByRole('form', { name: 'Ask for details' })
      .getByRole('button', { name: 'Ask for details' })
      .click();
    await office.getByText('More details needed').first().waitFor();
    await shot(office, 'office-workspace-asked');

    await expect.poll(() => mailFor(request.reference, owner.email), { timeout: 20_000, interval: 300 }).toBeTruthy();
    const mail = (await mailFor(request.reference, owner.email))!;
    expect(mail.text).toContain(question);
    const href = /https?:\/\/\S+\/my\/requests\/[0-9a-f-]{36}/.exec(mail.text)?.[0];
    expect(href).toBeTruthy();

    const home = await (await session.browser.newContext()).newPage();
    await signInAs(home, owner.email);
    await home.goto(href!);
    await home.getByLabel('Your answer').fill('It is 15 in, and the ditch is about 2 ft deep.');
    await home.getByRole('button', { name: 'Send my answer' }).click();
    await expect
      .poll(
        async () =>
          (await seeded.db.select({ s: requests.status }).from(requests).where(eq(requests.id, request.id)))[0].s,
      )
      .toBe('submitted');

    await office.goto(appUrl('/office/queue?status=submitted'));
    await office.getByRole('link', { name: request.reference }).waitFor();
    await office.getByRole('link', { name: request.reference }).click();
    await office.getByRole('button', { name: 'Messages' }).click();
    await office.getByText('It is 15 in, and the ditch is about 2 ft deep.').waitFor();
    await shot(office, 'office-workspace-answered');

    await office.getByRole('link', { name: 'E-mail log' }).click();
    const row = office.getByRole('row').filter({ hasText: owner.email }).filter({ hasText: request.reference });
    await row.first().waitFor();
    expect(await row.first().textContent()).toContain('Sent');
    await row
      .first()
      .getByRole('button', { name: /More details needed/ })
      .click();
    await office.getByText(question).first().waitFor();
    await shot(office, 'office-email-log');
  });

  it('fits a phone: the queue becomes cards with an order picker, and a request opens from one', async () => {
    const phone = await (await session.browser.newContext({ viewport: { width: 390, height: 844 } })).newPage();
    await signInAs(phone, staff.email);
    await phone.goto(appUrl('/office/queue'));
    await phone.getByLabel('Order').selectOption('reference:asc');
    await phone.waitForURL((url) => url.searchParams.get('sort') === 'reference');
    expect(await phone.getByRole('table').count()).toBe(0);
    await phone.getByRole('link', { name: request.reference }).click();
    await phone.getByRole('heading', { name: request.reference }).waitFor();
    const overflow = await phone.evaluate(
      () => document.documentElement.scrollWidth - document.documentElement.clientWidth,
    );
    expect(overflow).toBeLessThanOrEqual(0);
    await shot(phone, 'office-workspace-phone');
  });
});
