import { describe, expect, it } from 'vitest';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { appUrl, saveScreenshot, signInAs } from '../setup/browser';
import { gradeCheckStage, pasteCentreline } from '../setup/grade-check-stage';

const stage = gradeCheckStage('marrow-county');
const staff = demoPeople.filter((p) => p.role === 'staff')[0];

describe('a survey typed and not yet saved as a check', () => {
  it('asks before leaving, is kept as a draft and comes back when the grade check is reopened', async () => {
    const office = await stage.session.browser.newContext({ viewport: { width: 1366, height: 900 } });
    const page = await office.newPage();
    await signInAs(page, staff.email);
    const checkUrl = appUrl(`/office/requests/${stage.request.id}/grade-check`);
    await page.goto(checkUrl);
    await pasteCentreline(page);
    await page.getByLabel('Sight distance measured left (ft)').fill('650');
    await page.getByLabel('Sight distance measured right (ft)').fill('600');

    // Leaving by the screen's own link asks first; staying keeps everything on screen.
    await page.getByRole('link', { name: '← Back to the request' }).click();
    const question = page.getByRole('alertdialog', { name: 'This survey is not saved as a check' });
    await question.waitFor();
    await saveScreenshot(page, 'grade-check-draft-leave-question');
    await page.keyboard.press('Escape');
    await question.waitFor({ state: 'detached' });
    expect(new URL(page.url()).pathname).toMatch(/\/grade-check$/);
    expect(await page.getByLabel('Sight distance measured left (ft)').inputValue()).toBe('650');

    await page.getByRole('link', { name: '← Back to the request' }).click();
    await question.getByRole('button', { name: 'Leave; keep the draft' }).click();
    await page.waitForURL((u) => !u.pathname.endsWith('/grade-check'));

    // Reopened in a fresh page, as the next morning would be: the survey is back as typed.
    const again = await office.newPage();
    await again.goto(checkUrl);
    await again.getByText(/Your draft is back, as kept/).waitFor();
    expect(await again.getByLabel('Sight distance measured left (ft)').inputValue()).toBe('650');
    expect(await again.getByLabel('Sight distance measured right (ft)').inputValue()).toBe('600');
    await again.getByTestId('live-verdict').waitFor();
    await saveScreenshot(again, 'grade-check-draft-restored');

    // Saved as a check, the survey leaves without a question.
    await again.getByRole('button', { name: 'Save this check' }).click();
    await again.getByText('Saved as check 1.').waitFor();
    await again.getByRole('link', { name: '← Back to the request' }).click();
    await again.waitForURL((u) => !u.pathname.endsWith('/grade-check'));
    await page.close();
    await again.close();
    await office.close();
  });
});
