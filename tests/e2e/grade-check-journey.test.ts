import { eq } from 'drizzle-orm';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDb } from '../../server/db/client';
import { jurisdictions } from '../../server/db/schema';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { ensurePerson } from '../factories/people';
import { createRequestRow, type RequestRow } from '../factories/request-rows';
import { appUrl, launchBrowser, saveScreenshot, signInAs, signOut } from '../setup/browser';

/** A visit-booked request in Marrow County, whose 4% landing limit the surveyed 5.5% landing fails. */
let session: Awaited<ReturnType<typeof launchBrowser>>;
let db: ReturnType<typeof createDb>;
let request: RequestRow;
const applicant = demoPeople.filter((p) => p.role === 'applicant')[0];
const staff = demoPeople.filter((p) => p.role === 'staff')[0];

beforeAll(async () => {
  session = await launchBrowser();
  db = createDb(inject('stack').adminDatabaseUrl.replace(/\/postgres$/, '/gradepass_e2e'), { max: 2 });
  const owner = await ensurePerson(db.db, applicant);
  const [marrow] = await db.db.select().from(jurisdictions).where(eq(jurisdictions.slug, 'marrow-county'));
  request = await createRequestRow(db.db, {
    applicantId: owner.id,
    applicantName: applicant.name,
    status: 'visit_booked',
    jurisdictionId: marrow.id,
    visitAt: new Date(),
  });
});
afterAll(async () => {
  await db?.pool.end();
  await session?.close();
});

const shot = (page: Page, name: string) => saveScreenshot(page, `grade-check-${name}`);

const centreline = [
  'Station\tElevation',
  '0+00\t100.00',
  '0+10\t100.55',
  '0+20\t101.10',
  '0+40\t103.50',
  '0+60\t105.90',
  '0+80\t108.30',
].join('\n');
const verdict = (page: Page) => page.getByTestId('live-verdict');

describe('from visit booked to checked', () => {
  it('staff survey, fix the landing with the suggested profile, save, attach and mark checked; the owner reads the result', async () => {
    const context = await session.browser.newContext({ viewport: { width: 1440, height: 1000 } });
    const page = await context.newPage();
    await signInAs(page, staff.email);
    await page.goto(appUrl(`/office/requests/${request.id}`));
    await page.getByRole('link', { name: 'Survey and grade check' }).click();
    await page.waitForURL((u) => u.pathname.endsWith('/grade-check'));
    await page.getByText('Paste from a spreadsheet').click();
    await page.getByLabel('Pasted centreline').fill(centreline);
    await page.getByRole('button', { name: 'Use the pasted rows' }).click();
    await page.getByLabel('Sight distance measured left (ft)').fill('650');
    await page.getByLabel('Sight distance measured right (ft)').fill('600');

    await expect.poll(() => verdict(page).getAttribute('data-passes')).toBe('false');
    const landing = page.locator('tr[data-rule="landing.max-grade"]');
    expect(await landing.getAttribute('data-status')).toBe('fail');
    expect(await landing.textContent()).toContain('0+00');
    expect(await page.locator('svg [data-failing="0+00"]').count()).toBe(1);
    await shot(page, 'failing-landing');

    await page.getByRole('button', { name: 'Suggest a compliant profile' }).click();
    await page.getByRole('table', { name: 'Cut and fill' }).waitFor();
    await page.getByRole('button', { name: 'Apply the suggested profile' }).click();
    await expect.poll(() => verdict(page).getAttribute('data-passes')).toBe('true');
    expect(await page.locator('tr[data-rule="landing.max-grade"]').getAttribute('data-status')).toBe('pass');
    await shot(page, 'applied-proposal');

    await page.getByRole('button', { name: 'Save this check' }).click();
    await page.getByText('Saved as check 1.').waitFor();
    await page.getByRole('button', { name: 'Attach check 1' }).click();
    await page.getByRole('list', { name: 'Saved checks' }).getByText('Attached').waitFor();
    await page.getByRole('list', { name: 'Documents' }).getByRole('link', { name: 'Grade check 1 report' }).waitFor();
    await page.getByRole('button', { name: 'Mark grade check done' }).click();
    // The status badge and the action's own note both say it; whichever shows first will do.
    await page.getByText('Grade check done').first().waitFor();
    await shot(page, 'checked');
    await signOut(page);

    await signInAs(page, applicant.email);
    await page.goto(appUrl(`/my/requests/${request.id}`));
    const summary = page.getByTestId('check-summary');
    await summary.waitFor();
    expect(await summary.textContent()).toMatch(/needs a gentler slope near the road: here is what we propose/);
    expect(await summary.textContent()).toContain("meets Marrow County's rules (version 1)");
    await page.getByText('Grade check 1 report', { exact: true }).waitFor();
    await page.getByText('Grade check 1 report attached and shared with the homeowner.').waitFor();
    await shot(page, 'owner-view');
    await context.close();
  });
});
