import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDb } from '../../server/db/client';
import { emails } from '../../server/db/schema';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { appUrl, caughtMail, launchBrowser, saveScreenshot, signInAs } from '../setup/browser';

const staff = demoPeople.find((p) => p.role === 'staff')!;
const tag = randomUUID().slice(0, 8);

let session: Awaited<ReturnType<typeof launchBrowser>>;
let seeded: ReturnType<typeof createDb>;

beforeAll(async () => {
  session = await launchBrowser();
  seeded = createDb(inject('stack').adminDatabaseUrl.replace(/\/postgres$/, '/gradepass_e2e'), { max: 2 });
  // Two messages that gave up during a long mail outage, as the worker leaves them.
  await seeded.db.insert(emails).values(
    [1, 2].map((i) => ({
      toAddress: 'ellen.marsh@example.test',
      template: 'status-change',
      subject: `Outage check ${tag} ${i}`,
      textBody: 'Your request moved on.',
      htmlBody: '<p>Your request moved on.</p>',
      status: 'dead' as const,
      attempts: 40,
      lastError: 'ECONNREFUSED: connect ECONNREFUSED 127.0.0.1:25',
    })),
  );
});
afterAll(async () => {
  await session?.close();
  await seeded?.pool.end();
});

describe('the office after a long mail outage', () => {
  it('sends every message that gave up again with one button on the e-mail log', async () => {
    const page = await (await session.browser.newContext()).newPage();
    await signInAs(page, staff.email);
    await page.goto(appUrl('/office/emails'));
    const button = page.getByRole('button', { name: /^Send all \d+ again$/ });
    await button.waitFor();
    await saveScreenshot(page, 'office-emails-gave-up');
    await button.click();
    await page.getByText(/messages? (is|are) back in the queue/).waitFor();
    await saveScreenshot(page, 'office-emails-sent-again');
    const mine = async () => (await caughtMail()).filter((m) => m.subject.startsWith(`Outage check ${tag}`)).length;
    await expect.poll(mine, { timeout: 20_000, interval: 300 }).toBe(2);
  });
});
