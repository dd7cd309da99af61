import { describe, it } from 'vitest';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { appUrl, saveScreenshot, signInAs } from '../setup/browser';
import { gradeCheckStage, pasteCentreline } from '../setup/grade-check-stage';

/** A visit-booked request in Marrow County, whose 4% landing the surveyed 5.5% landing exceeds. */
const stage = gradeCheckStage('marrow-county');
const staff = demoPeople.filter((p) => p.role === 'staff')[0];
// The stage's request belongs to this demo owner.
const ownerPerson = demoPeople.filter((p) => p.role === 'applicant')[1];

describe('a grade check that fails the rules', () => {
  it('is attached only after the office says yes, reads plainly as failing to the owner, and can be withdrawn', async () => {
    const office = await stage.session.browser.newContext({ viewport: { width: 1440, height: 1000 } });
    const page = await office.newPage();
    await signInAs(page, staff.email);
    await page.goto(appUrl(`/office/requests/${stage.request.id}/grade-check`));
    await pasteCentreline(page);
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

    const home = await stage.session.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const ownerPage = await home.newPage();
    await signInAs(ownerPage, ownerPerson.email);
    await ownerPage.goto(appUrl(`/my/requests/${stage.request.id}`));
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
