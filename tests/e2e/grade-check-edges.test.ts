import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDb } from '../../server/db/client';
import { gradeChecks, jurisdictions, requests } from '../../server/db/schema';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { ensurePerson } from '../factories/people';
import { createRequestRow, type RequestRow } from '../factories/request-rows';
import { appUrl, launchBrowser, saveScreenshot, signInAs } from '../setup/browser';

/** A visit-booked request in the Town of Elderbrook, whose 6% landing takes the surveyed 5.5% landing. */
let session: Awaited<ReturnType<typeof launchBrowser>>;
let db: ReturnType<typeof createDb>;
let request: RequestRow;
const staff = demoPeople.filter((p) => p.role === 'staff')[0];
const crewLead = demoPeople.filter((p) => p.role === 'crew')[0];

beforeAll(async () => {
  session = await launchBrowser();
  db = createDb(inject('stack').adminDatabaseUrl.replace(/\/postgres$/, '/gradepass_e2e'), { max: 2 });
  const owner = await ensurePerson(db.db, demoPeople.filter((p) => p.role === 'applicant')[1]);
  const [town] = await db.db.select().from(jurisdictions).where(eq(jurisdictions.slug, 'town-of-elderbrook'));
  request = await createRequestRow(db.db, {
    applicantId: owner.id,
    status: 'visit_booked',
    jurisdictionId: town.id,
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

describe('the road edge, outlet control and the warped apron on screen', () => {
  it('the office enters them, sees the findings, the headwater and the warp stakes live; the crew reads them on the field sheet', async () => {
    const context = await session.browser.newContext({ viewport: { width: 1440, height: 1000 } });
    const page = await context.newPage();
    await signInAs(page, staff.email);
    await page.goto(appUrl(`/office/requests/${request.id}/grade-check`));
    await page.getByText('Paste from a spreadsheet').click();
    await page.getByLabel('Pasted centreline').fill(centreline);
    await page.getByRole('button', { name: 'Use the pasted rows' }).click();
    await page.getByTestId('live-verdict').waitFor();
    expect(await page.locator('tr[data-rule="grade.road-edge-change"]').getAttribute('data-status')).toBe(
      'not-checked',
    );

    await page.getByLabel('Road cross slope (%)').fill('2');
    await page.getByLabel('Shoulder width (ft)').fill('3');
    await page.getByText('Shoulder slope (%): give the shoulder slope for a shoulder this wide').waitFor();
    await page.getByLabel('Shoulder slope (%)').fill('4');
    await expect
      .poll(() => page.locator('tr[data-rule="grade.road-edge-change"]').getAttribute('data-status'))
      .toBe('pass');
    expect(await page.locator('tr[data-rule="grade.road-edge-change"]').textContent()).toContain(
      'Grade change at the road edge',
    );

    await page.getByLabel('There is a ditch: the entrance needs a culvert').check();
    await page.getByLabel('Flowline (invert) at the inlet (ft)').fill('98');
    await page.getByLabel('Flowline (invert) at the outlet (ft)').fill('97.7');
    await page.getByLabel('Driveway surface over the pipe (ft)').fill('100.5');
    await page.getByLabel('Pipe length (ft)').fill('30');
    await page.getByLabel('Design flow (cfs)').fill('4');
    await page.getByLabel('Tailwater depth in the outlet ditch (ft)').fill('0.5');
    await expect
      .poll(() => page.getByTestId('culvert-headwater').textContent())
      .toMatch(/(inlet|outlet) control governs \(inlet control [\d.]+ ft, outlet control [\d.]+ ft\)/);

    await page.getByLabel('Check both edges of the entrance and give the crew warp stakes').check();
    await page.getByLabel('Warp length (ft)').fill('20');
    await page.getByLabel('Warp stake every (ft)').fill('10');
    const stakes = page.getByRole('table', { name: 'Warp stakes' });
    await stakes.waitFor();
    // Stakes every 10 ft through the 15 ft landing and the 20 ft warp after it: 0+00 to 0+30, then 0+35.
    await expect.poll(() => stakes.locator('tbody tr').count()).toBe(5);
    expect(await page.locator('tr[data-rule="apron.left.landing.max-grade"]').textContent()).toContain(
      'Left edge of the entrance: landing grade (rising)',
    );
    await saveScreenshot(page, 'grade-check-edges-live');

    await page.getByRole('button', { name: 'Save this check' }).click();
    await page.getByText('Saved as check 1.').waitFor();
    await page.getByRole('button', { name: 'Attach check 1' }).click();
    // The left edge's landing is over the limit, so the check fails: the office says yes before it is attached.
    await page.getByText('Check 1 does not meet the rules').waitFor();
    await page.getByRole('button', { name: 'Attach it anyway' }).click();
    await page.getByRole('list', { name: 'Saved checks' }).getByText('Attached').waitFor();
    const [saved] = await db.db.select().from(gradeChecks).where(eq(gradeChecks.requestId, request.id));
    expect((saved.inputs as { roadSide?: unknown }).roadSide).toEqual({
      roadCrossSlopePercent: 2,
      shoulderWidthFt: 3,
      shoulderSlopePercent: 4,
    });
    await context.close();

    await db.db.update(requests).set({ status: 'released' }).where(eq(requests.id, request.id));
    const phone = await session.browser.newContext({
      viewport: { width: 412, height: 915 },
      isMobile: true,
      hasTouch: true,
    });
    const crewPage = await phone.newPage();
    await signInAs(crewPage, crewLead.email);
    await crewPage.goto(appUrl(`/crew/jobs/${request.id}/field-sheet`));
    await crewPage.getByRole('heading', { name: 'Warp stakes at the entrance edges' }).waitFor();
    expect(await crewPage.getByRole('table', { name: 'Warp stakes' }).locator('tbody tr').count()).toBe(5);
    await crewPage.getByText(/control governs/).waitFor();
    await saveScreenshot(crewPage, 'field-sheet-warp-stakes');
    await phone.close();
  });
});
