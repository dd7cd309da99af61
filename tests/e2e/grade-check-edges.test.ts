import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { gradeChecks, requests } from '../../server/db/schema';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { appUrl, saveScreenshot, signInAs } from '../setup/browser';
import { gradeCheckStage, pasteCentreline } from '../setup/grade-check-stage';

/** A visit-booked request in the Town of Elderbrook, whose 6% landing takes the surveyed 5.5% landing. */
const stage = gradeCheckStage('town-of-elderbrook');
const staff = demoPeople.filter((p) => p.role === 'staff')[0];
const crewLead = demoPeople.filter((p) => p.role === 'crew')[0];

describe('the road edge, outlet control and the warped apron on screen', () => {
  it('the office enters them, sees the findings, the headwater and the warp stakes live; the crew reads them on the field sheet', async () => {
    const context = await stage.session.browser.newContext({ viewport: { width: 1440, height: 1000 } });
    const page = await context.newPage();
    await signInAs(page, staff.email);
    await page.goto(appUrl(`/office/requests/${stage.request.id}/grade-check`));
    await pasteCentreline(page);
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
    const [saved] = await stage.db.db.select().from(gradeChecks).where(eq(gradeChecks.requestId, stage.request.id));
    expect((saved.inputs as { roadSide?: unknown }).roadSide).toEqual({
      roadCrossSlopePercent: 2,
      shoulderWidthFt: 3,
      shoulderSlopePercent: 4,
    });
    await context.close();

    await stage.db.db.update(requests).set({ status: 'released' }).where(eq(requests.id, stage.request.id));
    const phone = await stage.session.browser.newContext({
      viewport: { width: 412, height: 915 },
      isMobile: true,
      hasTouch: true,
    });
    const crewPage = await phone.newPage();
    await signInAs(crewPage, crewLead.email);
    await crewPage.goto(appUrl(`/crew/jobs/${stage.request.id}/field-sheet`));
    await crewPage.getByRole('heading', { name: 'Warp stakes at the entrance edges' }).waitFor();
    expect(await crewPage.getByRole('table', { name: 'Warp stakes' }).locator('tbody tr').count()).toBe(5);
    await crewPage.getByText(/control governs/).waitFor();
    await saveScreenshot(crewPage, 'field-sheet-warp-stakes');
    await phone.close();
  });
});
