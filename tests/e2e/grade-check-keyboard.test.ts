import { describe, expect, it } from 'vitest';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { appUrl, signInAs } from '../setup/browser';
import { gradeCheckStage, surveyedCentreline } from '../setup/grade-check-stage';
import { expectScreenClean, newSizedContext, tabUntilFocused, watchConsole } from '../setup/page-checks';

/** The grade check by keyboard alone, on a phone-sized screen: survey, verdict, suggestion, save. */
const stage = gradeCheckStage('marrow-county');
const staff = demoPeople.filter((p) => p.role === 'staff')[0];

describe('the grade check from the keyboard', () => {
  it('takes a pasted survey, shows the failing landing, applies the suggestion and saves, with Tab and Enter only', async () => {
    const context = await newSizedContext(stage.session.browser, 'phone');
    const page = await context.newPage();
    const heard = watchConsole(page);
    await signInAs(page, staff.email);
    await page.goto(appUrl(`/office/requests/${stage.request.id}/grade-check`));
    await page.getByRole('heading', { level: 1 }).waitFor();
    const verdict = page.getByTestId('live-verdict');

    await tabUntilFocused(page, page.getByText('Paste from a spreadsheet'));
    await page.keyboard.press('Enter');
    await tabUntilFocused(page, page.getByLabel('Pasted centreline'));
    // Typed text, not a fill: a Tab key would move on, so the rows arrive the way a paste puts them in.
    await page.keyboard.insertText(surveyedCentreline);
    await tabUntilFocused(page, page.getByRole('button', { name: 'Use the pasted rows' }));
    await page.keyboard.press('Enter');
    await tabUntilFocused(page, page.getByLabel('Sight distance measured left (ft)'));
    await page.keyboard.type('650');
    await tabUntilFocused(page, page.getByLabel('Sight distance measured right (ft)'));
    await page.keyboard.type('600');
    await expect.poll(() => verdict.getAttribute('data-passes')).toBe('false');

    await tabUntilFocused(page, page.getByRole('button', { name: 'Suggest a compliant profile' }));
    await page.keyboard.press('Enter');
    await page.getByRole('table', { name: 'Cut and fill' }).waitFor();
    await tabUntilFocused(page, page.getByRole('button', { name: 'Apply the suggested profile' }));
    await page.keyboard.press('Enter');
    await expect.poll(() => verdict.getAttribute('data-passes')).toBe('true');

    await tabUntilFocused(page, page.getByRole('button', { name: 'Save this check' }));
    await page.keyboard.press('Enter');
    await page.getByText('Saved as check 1.').waitFor();
    await expectScreenClean(page, heard, 'grade-check-keyboard-phone');
    await context.close();
  });
});
