import { eq } from 'drizzle-orm';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { createDb } from '../../server/db/client';
import { gradeChecks, requests } from '../../server/db/schema';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { ensurePerson } from '../factories/people';
import { createSentQuote } from '../factories/quotes';
import { createRequestRow, type RequestRow } from '../factories/request-rows';
import { appUrl, caughtMail, launchBrowser, saveScreenshot, signInAs } from '../setup/browser';

let session: Awaited<ReturnType<typeof launchBrowser>>;
let db: ReturnType<typeof createDb>;
let request: RequestRow;
const owner = demoPeople.find((p) => p.email === 'sam.whitcombe@example.test')!;
const office = demoPeople.find((p) => p.role === 'staff')!;

beforeAll(async () => {
  session = await launchBrowser();
  db = createDb(inject('stack').adminDatabaseUrl.replace(/\/postgres$/, '/gradepass_e2e'), { max: 2 });
  const person = await ensurePerson(db.db, owner);
  const clerk = await ensurePerson(db.db, office);
  request = await createRequestRow(db.db, {
    applicantId: person.id,
    applicantName: owner.name,
    status: 'checked',
    siteAddress: '311 Thimbleberry Lane, Elderbrook',
  });
  const quote = await createSentQuote(db.db, {
    requestId: request.id,
    createdById: clerk.id,
    totalCents: 1_234_567,
    depositCents: 370_370,
  });
  // The factory's check has no stored report to show the owner; the quote keeps it, the page does not list it.
  await db.db.update(gradeChecks).set({ attachedAt: null }).where(eq(gradeChecks.id, quote.gradeCheckId));
});
afterAll(async () => {
  await db?.pool.end();
  await session?.close();
});

/** The stand-in's card page, filled as a person does. */
async function payByCard(page: Page, card: string, amount: string) {
  await page.waitForURL((url) => url.pathname.startsWith('/pay/cs_'));
  await expect.poll(() => page.getByTestId('amount').textContent()).toBe(amount);
  await page.getByLabel('Card number').fill(card);
  await page.getByLabel('Expiry (MM/YY)').fill('12/34');
  await page.getByLabel('Security code').fill('123');
  await page.getByRole('button', { name: `Pay ${amount}` }).click();
}

describe('the owner pays the deposit and the final invoice', () => {
  it('goes to the payment page and back, twice, with a receipt each time', async () => {
    const context = await session.browser.newContext();
    const page = await context.newPage();
    const noise: string[] = [];
    // Two notices every page of the app gives today (the router's start-up hint, and "not signed in" before
    // signing in) are not this journey's; anything else on the app's pages or the payment page is.
    const known = [/HydrateFallback/, /status of 401/, /\/authorize\?/];
    page.on('console', (m) => {
      const line = `${page.url()}: ${m.text()}`;
      if ((m.type() === 'error' || m.type() === 'warning') && !known.some((k) => k.test(line))) noise.push(line);
    });
    page.on('pageerror', (e) => noise.push(e.message));
    await signInAs(page, owner.email);
    const [quote] = await (
      await page.request.get(appUrl(`/api/requests/${request.id}/quotes`))
    )
      .json()
      .then((b) => b.quotes);
    expect(
      (await page.request.post(appUrl(`/api/quotes/${quote.id}/accept`), { data: { name: owner.name } })).status(),
    ).toBe(200);

    await page.goto(appUrl(`/my/requests/${request.id}`));
    const money = page.getByRole('list', { name: 'Money steps' });
    await expect.poll(() => money.getByTestId('money-deposit').textContent()).toContain('due now');
    await saveScreenshot(page, 'payments-1-deposit-due');
    await page.getByRole('button', { name: 'Pay the deposit ($3,703.70)' }).click();
    await payByCard(page, '4242 4242 4242 4242', '$3,703.70');

    await page.waitForURL(
      (url) => url.origin === new URL(appUrl()).origin && url.pathname === `/my/requests/${request.id}`,
    );
    await page.getByText('Thank you: your payment is recorded.').waitFor();
    await expect.poll(() => money.getByTestId('money-deposit').textContent()).toContain('Card, online');
    await page.getByRole('list', { name: 'Timeline' }).getByText('Deposit paid').waitFor();
    await saveScreenshot(page, 'payments-2-deposit-paid');

    // The crew builds the entrance; the final invoice is the agreed total less the deposit.
    await db.db
      .update(requests)
      .set({ status: 'built', version: request.version + 5 })
      .where(eq(requests.id, request.id));
    await page.goto(appUrl(`/my/requests/${request.id}`));
    await page.getByRole('button', { name: 'Pay the final invoice ($8,641.97)' }).click();
    await payByCard(page, '4000 0025 0000 3155', '$8,641.97');
    // This card's bank asks the payer to confirm first.
    await page.getByRole('heading', { name: 'Confirm the payment' }).waitFor();
    await page.getByRole('button', { name: 'Yes, I confirm' }).click();
    await page.getByText('Thank you: your payment is recorded.').waitFor();
    await expect.poll(() => money.getByTestId('money-balance').textContent()).toContain('Card, online');
    await page.getByText('Everything is paid. Thank you.').waitFor();
    await page.getByRole('list', { name: 'Timeline' }).getByText('Balance paid').waitFor();
    await saveScreenshot(page, 'payments-3-paid-in-full');

    // The owner's e-mails about this request, in the order they were sent.
    await expect
      .poll(
        async () =>
          (await caughtMail())
            .filter((m) => m.to.includes(owner.email) && m.subject.includes(request.reference))
            .map((m) => m.subject),
        { timeout: 20_000 },
      )
      .toEqual([
        `Receipt: deposit of $3,703.70 for ${request.reference}`,
        `Receipt: balance of $8,641.97 for ${request.reference}`,
      ]);
    expect(noise).toEqual([]);
    await context.close();
  });

  it('shows the office both payments in its payments view, with the CSV for the bookkeeper', async () => {
    const context = await session.browser.newContext();
    const page = await context.newPage();
    await signInAs(page, office.email);
    await page.getByRole('link', { name: 'Payments', exact: true }).click();
    await page.getByRole('button', { name: 'Paid', exact: true }).click();
    const rows = page.getByRole('row').filter({ hasText: request.reference });
    await expect.poll(() => rows.count()).toBe(2);
    expect(await rows.allTextContents()).toEqual(
      expect.arrayContaining([expect.stringContaining('$3,703.70'), expect.stringContaining('$8,641.97')]),
    );
    const csv = await (await page.request.get(appUrl('/api/payments/export.csv?state=paid'))).text();
    expect(csv.split('\r\n').filter((line) => line.startsWith(request.reference))).toHaveLength(2);
    await saveScreenshot(page, 'payments-4-office-view');
    await context.close();
  });
});
