import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { desc } from 'drizzle-orm';
import type { RateCardPrices } from '@shared/contracts/rate-cards';
import { createDb } from '../../server/db/client';
import { rateCardVersions } from '../../server/db/schema';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { appUrl, launchBrowser, saveScreenshot, signInAs } from '../setup/browser';

const admin = demoPeople.find((p) => p.role === 'admin')!;
const staff = demoPeople.find((p) => p.role === 'staff')!;
let session: Awaited<ReturnType<typeof launchBrowser>>;
let db: ReturnType<typeof createDb>;
beforeAll(async () => {
  session = await launchBrowser();
  db = createDb(inject('stack').adminDatabaseUrl.replace(/\/postgres$/, '/gradepass_e2e'), { max: 2 });
});
afterAll(async () => {
  await db?.pool.end();
  await session?.close();
});

function watchConsole(page: Page) {
  const noise: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error') noise.push(m.text());
  });
  page.on('pageerror', (e) => noise.push(e.message));
  return noise;
}

describe('the rate card', () => {
  it('the admin drafts a new version, is stopped at a fraction of a cent, and publishes after confirming', async () => {
    const page = await (await session.browser.newContext({ viewport: { width: 1280, height: 1000 } })).newPage();
    await signInAs(page, admin.email);
    const noise = watchConsole(page);
    await page.goto(appUrl('/office/rate-card'));
    await page.getByRole('heading', { name: 'Rate card', exact: true }).waitFor();
    await page.getByRole('button', { name: 'Start a new version from this one' }).click();
    const excavation = page.getByLabel('Excavation, per bank cu yd ($)');
    await excavation.waitFor();
    await excavation.fill('19.255');
    await page.getByRole('button', { name: 'Save draft' }).click();
    await page.getByText('Excavation, per bank cu yd must be dollars and cents, zero or more (like 18.50)').waitFor();
    await excavation.fill('19.25');
    await page.getByLabel('Deposit share (%)').fill('25');
    await page.getByLabel('What changed').fill('Fuel went up; deposit down to a quarter');
    await page.getByRole('button', { name: 'Save draft' }).click();
    await page.getByText('Draft saved.').waitFor();
    await saveScreenshot(page, 'rate-card-draft');

    const publish = page.getByRole('button', { name: /^Publish version \d+…$/ });
    await publish.click();
    await page.getByRole('group', { name: 'Confirm publishing' }).waitFor();
    await page.getByRole('button', { name: 'Cancel' }).click();
    const [still] = await db.db.select().from(rateCardVersions).orderBy(desc(rateCardVersions.version)).limit(1);
    expect(still.status).toBe('draft');
    await publish.click();
    await page.getByRole('button', { name: /^Yes, publish version \d+$/ }).click();
    await page.getByText(/current, read only/).waitFor();
    await saveScreenshot(page, 'rate-card-published');

    const [latest] = await db.db.select().from(rateCardVersions).orderBy(desc(rateCardVersions.version)).limit(1);
    expect(latest.status).toBe('published');
    const prices = latest.prices as RateCardPrices;
    expect(prices.excavationPerBankCyCents).toBe(1925);
    expect(prices.depositBp).toBe(2500);
    expect(noise).toEqual([]);

    // The office reads the prices but has no way to change them.
    const office = await (await session.browser.newContext()).newPage();
    await signInAs(office, staff.email);
    await office.goto(appUrl('/office/rate-card'));
    await office.getByText('Only an admin changes prices').waitFor();
    expect(await office.getByRole('button', { name: 'Start a new version from this one' }).count()).toBe(0);
  });
});
