import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, inject, it } from 'vitest';
import { createDb } from '../../server/db/client';
import { jurisdictions } from '../../server/db/schema';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { ensurePerson } from '../factories/people';
import { createRequestRow, type RequestRow } from '../factories/request-rows';
import { appUrl, launchBrowser, saveScreenshot, signInAs } from '../setup/browser';

/** A visit-booked request in Marrow County, whose 4% landing the surveyed 5.5% landing exceeds. */
let session: Awaited<ReturnType<typeof launchBrowser>>;
let db: ReturnType<typeof createDb>;
let request: RequestRow;
const staff = demoPeople.filter((p) => p.role === 'staff')[0];
const ownerPerson = demoPeople.filter((p) => p.role === 'applicant')[1];

beforeAll(async () => {
  session = await launchBrowser();
  db = createDb(inject('stack').adminDatabaseUrl.replace(/\/postgres$/, '/gradepass_e2e'), { max: 2 });
  const owner = await ensurePerson(db.db, ownerPerson);
  const [marrow] = await db.db.select().from(jurisdictions).where(eq(jurisdictions.slug, 'marrow-county'));
  request = await createRequestRow(db.db, {
    applicantId: owner.id,
    status: 'visit_booked',
    jurisdictionId: marrow.id,
    visitAt: new Date(),
  });
});
afterAll(async () => {
  await db?.pool.end();
  await session?.close();
});

const centreline = [
  'Station\tElevation',
  '0+00\t100.00',
  '0+10\t100.55',
  '0+20\t101.10',
  '0+40\t103.50',
  '0+60\t105.90',
  '0+80\t108.30',
].join('\n');

describe('a grade check that fails the rules', () => {
  it('is attached only after the office says yes, reads plainly as failing to the owner, and can be withdrawn', async () => {
    const office = await session.browser.newContext({ viewport: { width: 1440, height: 1000 } });
    const page = await office.newPage();
    await signInAs(page, staff.email);
    await page.goto(appUrl(`/office/requests/${request.id}/grade-check`));
    await page.getByText('Paste from a spreadsheet').click();
    await page.getByLabel('Pasted centreline').fill(centreline);
    await page.getByRole('button', { name: 'Use the pasted rows' }).click();
    await page.getByLabel('Sight distance measured left (ft)').fill('650');
    await page.getByLabel('Sight distance measured right (ft)').fill('600');
    await page.getByRole('button', { name: 'Save this check' }).click();
    await page.getByText('Saved as check 1.').waitFor();

    await page.getByRole('button', { name: 'Attach check 1' }).click();
    await page.getByText('Check 1 does not meet the rules').waitFor();
    await saveScreenshot(page, 'grade-check-failing-confirm');
    await page.getByRole('button', { name: 'Keep it unattached' }).click();
    await page.getByRole('button', { name: 'Attach check 1' }).click();
    await page.getByRole('button', { name: 'Attach it anyway' }).click();
    await page.getByRole('list', { name: 'Saved checks' }).getByText('Attached').waitFor();

    const home = await session.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const ownerPage = await home.newPage();
    await signInAs(ownerPage, ownerPerson.email);
    await ownerPage.goto(appUrl(`/my/requests/${request.id}`));
    await ownerPage.getByText(/Grade check 1, .*: does not meet the road authority’s rules yet/).waitFor();
    await ownerPage.getByText('The entrance as checked is outside the rules.', { exact: false }).waitFor();
    await saveScreenshot(ownerPage, 'grade-check-failing-owner');

    await page.getByRole('button', { name: 'Withdraw check 1' }).click();
    await page.getByRole('button', { name: 'Attach check 1' }).waitFor();
    await ownerPage.reload();
    await ownerPage.getByText('The office has not finished the grade check yet.', { exact: false }).waitFor();
    await home.close();
    await office.close();
  });
});
