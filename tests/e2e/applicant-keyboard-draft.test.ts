import { randomUUID } from 'node:crypto';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, signInAs } from '../setup/browser';

let session: Awaited<ReturnType<typeof launchBrowser>>;
beforeAll(async () => {
  session = await launchBrowser();
});
afterAll(() => session?.close());

const focusedText = (page: Page) =>
  page.evaluate(() => {
    const el = document.activeElement as HTMLElement | null;
    if (!el) return '';
    const label = el.id ? document.querySelector(`label[for="${CSS.escape(el.id)}"]`)?.textContent : null;
    return (label ?? el.closest('label')?.textContent ?? el.textContent ?? '').trim();
  });

/** Moves focus the way a keyboard user does, one Tab at a time, until it reaches the named control. */
async function tabTo(page: Page, name: string | RegExp) {
  for (let i = 0; i < 80; i += 1) {
    await page.keyboard.press('Tab');
    const text = await focusedText(page);
    if (typeof name === 'string' ? text === name : name.test(text)) return;
  }
  throw new Error(`Tab never reached "${name}"`);
}

const valueOf = (page: Page, label: string) => page.getByLabel(label, { exact: true }).inputValue();

describe('the wizard by keyboard alone, and a draft that survives leaving', () => {
  it('fills a step with keys only, keeps unsaved answers on leaving, and reopens where it stopped', async () => {
    const context = await session.browser.newContext();
    const page = await context.newPage();
    await signInAs(page, `maren.toll-${randomUUID().slice(0, 6)}@example.test`, 'Maren Toll');
    await page.waitForURL((url) => url.pathname === '/my/requests');

    await tabTo(page, 'Start a new request');
    await page.keyboard.press('Enter');
    await tabTo(page, 'Start the form');
    await page.keyboard.press('Enter');
    await page.waitForURL(/\/edit$/);
    const editUrl = page.url();

    await tabTo(page, 'Street address of the property');
    await page.keyboard.type('9 Heron Marsh Road, Tillbury');
    await tabTo(page, 'Road the entrance joins');
    await page.keyboard.type('Saltmeadow Pike');
    // A radio group is one Tab stop; the arrow keys choose within it.
    await tabTo(page, 'The county');
    await page.keyboard.press('ArrowDown');
    await tabTo(page, 'Landmark');
    await page.keyboard.type('the white church');

    // Leave through the menu without pressing "Save and continue": the answers are saved on the way out.
    await tabTo(page, 'My requests');
    await page.keyboard.press('Enter');
    await page.waitForURL((url) => url.pathname === '/my/requests');
    await page.getByText('9 Heron Marsh Road, Tillbury').waitFor();
    await tabTo(page, /^GP-\d{4}-\d{5}$/);
    await page.keyboard.press('Enter');
    await page.waitForURL(editUrl);
    await page.getByRole('heading', { name: /Step 1 of 4/ }).waitFor();
    expect(await valueOf(page, 'Road the entrance joins')).toBe('Saltmeadow Pike');
    expect(await page.getByLabel('The town or township').isChecked()).toBe(true);
    expect(await valueOf(page, 'Landmark')).toBe('the white church');

    await tabTo(page, 'Distance from the landmark, ft');
    await page.keyboard.type('140');
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { name: /Step 2 of 4/ }).waitFor();
    expect(await focusedText(page)).toMatch(/Step 2 of 4/);

    await tabTo(page, /^Anything else the office should know/);
    await page.keyboard.type('The gate post on the left will move.');
    // The tab's last save travels as a keepalive request, which can land just after the reloaded page asks
    // for the draft; a second look a moment later must find it.
    const notesAfterReload = async () => {
      await page.reload();
      await page.getByRole('heading', { name: /Step 2 of 4/ }).waitFor();
      return page.getByLabel(/Anything else the office should know/).inputValue();
    };
    await expect
      .poll(notesAfterReload, { timeout: 10_000, interval: 500 })
      .toBe('The gate post on the left will move.');
    await context.close();
  });
});
