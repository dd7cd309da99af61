import { afterAll, beforeAll, describe, inject, it } from 'vitest';
import { createDb } from '../../server/db/client';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { ensurePerson } from '../factories/people';
import { createRequestRow, type RequestRow } from '../factories/request-rows';
import { appUrl, launchBrowser, saveScreenshot, signInAs } from '../setup/browser';

let session: Awaited<ReturnType<typeof launchBrowser>>;
let db: ReturnType<typeof createDb>;
let request: RequestRow;
const staff = demoPeople.filter((p) => p.role === 'staff')[0];

beforeAll(async () => {
  session = await launchBrowser();
  db = createDb(inject('stack').adminDatabaseUrl.replace(/\/postgres$/, '/gradepass_e2e'), { max: 2 });
  const owner = await ensurePerson(db.db, demoPeople.filter((p) => p.role === 'applicant')[0]);
  // Two days ahead at mid-morning: inside this month or the next, reached from the keyboard either way.
  const at = new Date(Date.now() + 2 * 86_400_000);
  at.setHours(10, 30, 0, 0);
  request = await createRequestRow(db.db, {
    applicantId: owner.id,
    status: 'visit_booked',
    visitAt: at,
    siteAddress: '7 Quillmoor Bend, Fenwick Falls',
  });
});
afterAll(async () => {
  await db?.pool.end();
  await session?.close();
});

describe('the office calendar', () => {
  it('shows a booked visit by month and by week, moves by keyboard, and opens the request', async () => {
    const context = await session.browser.newContext({ viewport: { width: 1366, height: 900 } });
    const page = await context.newPage();
    await signInAs(page, staff.email);
    await page.goto(appUrl('/office/queue'));
    await page.getByRole('link', { name: 'Calendar' }).click();
    await page.getByRole('heading', { name: 'Calendar' }).waitFor();
    const entry = page.getByRole('link', { name: new RegExp(`^Site visit 10:30 AM · ${request.reference}$`) });
    await page.getByText(/ in these days|Nothing booked in these days/).waitFor();
    await saveScreenshot(page, 'office-calendar-opened');
    // Two days ahead may fall in next month: the keyboard moves there.
    if ((await entry.count()) === 0) {
      await page.getByRole('button', { name: 'Next month' }).focus();
      await page.keyboard.press('Enter');
    }
    await entry.waitFor();
    await saveScreenshot(page, 'office-calendar-month');

    await page.getByRole('button', { name: 'Today' }).click();
    await page.getByRole('button', { name: 'Week' }).focus();
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { name: /^Week of / }).waitFor();
    if ((await entry.count()) === 0) await page.getByRole('button', { name: 'Next week' }).click();
    await entry.waitFor();
    await saveScreenshot(page, 'office-calendar-week');

    await entry.focus();
    await page.keyboard.press('Enter');
    await page.waitForURL((u) => u.pathname === `/office/requests/${request.id}`);
    await page.getByText(request.reference).first().waitFor();
    await context.close();
  });
});
