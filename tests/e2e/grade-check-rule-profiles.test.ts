import { randomUUID } from 'node:crypto';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { appUrl, launchBrowser, saveScreenshot, signInAs, signOut } from '../setup/browser';

let session: Awaited<ReturnType<typeof launchBrowser>>;
beforeAll(async () => {
  session = await launchBrowser();
});
afterAll(() => session?.close());

const admin = demoPeople.find((p) => p.role === 'admin')!;
const staff = demoPeople.find((p) => p.role === 'staff')!;

const shot = (page: Page, name: string) => saveScreenshot(page, `rule-profiles-${name}`);

describe('rule profile versions', () => {
  it('an admin starts an authority from the template, publishes it, publishes a stricter version and compares them; staff only read', async () => {
    // A new authority of its own, so the demo authorities other browser tests check against stay as seeded.
    const name = `Tallis Ford Township ${randomUUID().slice(0, 4)}`;
    const context = await session.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    await signInAs(page, admin.email);
    await page.goto(appUrl('/office/rule-profiles'));
    await page.getByRole('table', { name: 'Road authorities' }).getByRole('link', { name: 'Marrow County' }).waitFor();
    await page.getByLabel('Jurisdiction').fill(name);
    await page.getByLabel('Road authority').fill('Tallis Ford Road Commission');
    await page.getByRole('button', { name: 'Start from the template' }).click();
    await page.getByRole('heading', { level: 1, name }).waitFor();

    const landing = page.getByLabel('Landing: steepest rise away from the road (%)');
    expect(await landing.inputValue()).toBe('4');
    await landing.fill('5');
    await page
      .getByLabel('Source for landing: steepest rise away from the road')
      .fill('Road Commission resolution 14, item 3');
    await page.getByLabel('Maximum driveway grade beyond the landing (%)').fill('steep');
    await page.getByRole('button', { name: 'Save draft' }).click();
    await page.getByText('"steep" is not a number').waitFor();
    await page.getByLabel('Maximum driveway grade beyond the landing (%)').fill('16');
    await page.getByRole('button', { name: 'Save draft' }).click();
    await page.getByText('Draft saved.').waitFor();
    await shot(page, 'draft');
    // Publishing asks first: one press alone publishes nothing, Cancel steps back.
    await page.getByRole('button', { name: 'Publish version 1' }).click();
    await page.getByText(/Publish version 1\? It is frozen once published/).waitFor();
    await page.getByRole('button', { name: 'Cancel' }).click();
    await page.getByRole('button', { name: 'Publish version 1' }).click();
    expect(await page.getByText('Version 1 · published, read only').count()).toBe(0);
    await page.getByRole('button', { name: 'Yes, publish version 1' }).click();
    await page.getByText('Version 1 · published, read only').waitFor();

    await page.getByRole('button', { name: 'Start a new version from this one' }).click();
    await page.getByText('Version 2 · draft').waitFor();
    await page.getByLabel('Maximum driveway grade beyond the landing (%)').fill('14');
    await page.getByLabel('What changed in this version').fill('Steepest grade cut to 14%');
    await page.getByRole('button', { name: 'Publish version 2' }).click();
    await page.getByRole('button', { name: 'Yes, publish version 2' }).click();
    await page.getByText('Version 2 · published, read only').waitFor();
    const compare = page.getByRole('table', { name: 'Version differences' });
    await compare.waitFor();
    expect(await page.getByText('1 value differs.').count()).toBe(1);
    const changed = compare.locator('tr[data-changed="true"]');
    expect(await changed.count()).toBe(1);
    expect(await changed.textContent()).toMatch(/Maximum driveway grade.*16.*14/);
    await shot(page, 'compare');
    const url = page.url();
    await signOut(page);

    await signInAs(page, staff.email);
    await page.goto(url);
    await page.getByText(/Version 2 · published, read only/).waitFor();
    expect(await page.getByRole('button', { name: /Start a new version/ }).count()).toBe(0);
    expect(await page.getByText('Road Commission resolution 14, item 3').count()).toBeGreaterThan(0);
    await context.close();
  });
});
