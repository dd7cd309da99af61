import { randomUUID } from 'node:crypto';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { solidPng } from '../factories/photo-images';
import { appUrl, caughtMail, launchBrowser, saveScreenshot, signInAs, siteJpeg } from '../setup/browser';

let session: Awaited<ReturnType<typeof launchBrowser>>;
beforeAll(async () => {
  session = await launchBrowser();
});
afterAll(() => session?.close());

const isFocused = (page: Page, label: string) =>
  page.getByLabel(label, { exact: true }).evaluate((el) => el === document.activeElement);

const sitePhoto = (page: Page) => siteJpeg(page, 44.26012, -72.57541);

async function mailFor(address: string) {
  return (await caughtMail()).filter((m) => m.to.some((to) => to.toLowerCase().includes(address)));
}

describe('a new homeowner asks for an entrance', () => {
  it('fills the wizard with two photos, sends it, follows it and gets a receipt', async () => {
    const email = `hollis.pembury-${randomUUID().slice(0, 6)}@example.test`;
    const context = await session.browser.newContext();
    const page = await context.newPage();
    const pageErrors: string[] = [];
    page.on('pageerror', (error) => pageErrors.push(error.message));
    await signInAs(page, email, 'Hollis Pembury');
    await page.waitForURL((url) => url.pathname === '/my/requests');
    await page.getByRole('link', { name: 'Start a new request' }).click();
    await page.getByRole('button', { name: 'Start the form' }).click();
    await page.waitForURL(/\/my\/requests\/[0-9a-f-]+\/edit$/);

    // An empty step: every message sits by its field and focus goes to the first one.
    await page.getByRole('button', { name: 'Save and continue' }).click();
    await page.getByText('Enter the street address of the property.').waitFor();
    expect(await isFocused(page, 'Street address of the property')).toBe(true);

    await page.getByLabel('Street address of the property').fill('27 Alder Brook Lane, Wrenfield');
    await page.getByLabel('Road the entrance joins').fill('Cobble Hill Road');
    await page.getByLabel('The county').check();
    await page.getByLabel('Posted speed limit, mph (if known)').fill('35');
    await page.getByLabel('Landmark', { exact: true }).fill('the red barn');
    await page.getByLabel('Distance from the landmark, ft').fill('220');
    await page.getByLabel('Distance from the landmark, ft').press('Enter');

    await page.getByRole('heading', { name: /Step 2 of 4/ }).waitFor();
    expect(
      await page.getByRole('heading', { name: /Step 2 of 4/ }).evaluate((el) => el === document.activeElement),
    ).toBe(true);
    await page.getByLabel('A new entrance').check();
    await page.getByLabel('A home').check();
    await page.getByLabel('Cars and pickups').check();
    await page.getByLabel('Trailers, campers or long loads').check();
    await page.getByLabel('An open ditch, no pipe').check();
    await page.getByRole('button', { name: 'Save and continue' }).click();

    await page.getByRole('heading', { name: /Step 3 of 4/ }).waitFor();
    await page
      .locator('.uppy-Dashboard-input')
      .first()
      .setInputFiles([
        { name: 'road-left.jpg', mimeType: 'image/jpeg', buffer: await sitePhoto(page) },
        { name: 'ditch.png', mimeType: 'image/png', buffer: solidPng(40, 30, [120, 96, 60]) },
      ]);
    await page.getByText('2 photos').waitFor({ timeout: 30_000 });
    await page.getByRole('button', { name: 'Use this position' }).click();
    await page.getByText('The site position is now set from your photo.').waitFor();
    await page.getByLabel('What does “ditch.png” show?').fill('The ditch where the entrance goes');
    await page.getByLabel('What does “ditch.png” show?').press('Enter');
    await page.getByText('Caption saved.').waitFor();
    await saveScreenshot(page, 'applicant-wizard-photos');
    await page.getByRole('button', { name: 'Save and continue' }).click();

    await page.getByRole('heading', { name: /Step 4 of 4/ }).waitFor();
    await page.getByText('44.26012, -72.57541').waitFor();
    await page.getByRole('button', { name: 'Send to the office' }).click();

    await page.waitForURL(/\/my\/requests\/[0-9a-f-]+$/);
    const reference = (await page
      .getByText(/Reference GP-\d{4}-\d{5}/)
      .first()
      .textContent())!.match(/GP-\d{4}-\d{5}/)![0];
    await page.getByText('Sent to the office').first().waitFor();
    const timeline = page.getByRole('list', { name: 'Timeline' });
    await timeline.getByText('Sent to the office').waitFor();
    const photos = page.getByRole('list', { name: 'Site photos' }).getByRole('img');
    await expect.poll(() => photos.count()).toBe(2);
    await expect
      .poll(() => photos.evaluateAll((imgs) => imgs.every((img) => (img as HTMLImageElement).naturalWidth > 0)))
      .toBe(true);
    await page.getByRole('img', { name: 'The ditch where the entrance goes' }).waitFor();
    const requestId = new URL(page.url()).pathname.split('/').pop();
    const listed = (await (await page.request.get(appUrl(`/api/requests/${requestId}/photos`))).json()).photos as {
      fileName: string;
      url: string;
      gpsLat: number | null;
    }[];
    const jpeg = listed.find((p) => p.fileName === 'road-left.jpg')!;
    const storedJpeg = Buffer.from(await (await fetch(jpeg.url)).arrayBuffer());
    expect(storedJpeg.subarray(0, 2).toString('hex')).toBe('ffd8');
    expect(storedJpeg.includes(Buffer.from('Exif\0\0', 'latin1'))).toBe(false);
    expect(jpeg.gpsLat).toBeCloseTo(44.26012, 4);
    await saveScreenshot(page, 'applicant-request-page');

    await page.goto(appUrl('/my/requests'));
    const row = page.getByRole('row', { name: new RegExp(reference) });
    await row.getByText('Sent to the office').waitFor();
    await row.getByText('Nothing for now').waitFor();

    await expect
      .poll(async () => (await mailFor(email)).map((m) => m.subject).join(' | '), { timeout: 30_000, interval: 500 })
      .toContain(reference);
    await saveScreenshot(page, 'applicant-my-requests');
    expect(pageErrors).toEqual([]);
    await context.close();
  });
});
