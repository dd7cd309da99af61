import { randomUUID } from 'node:crypto';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { statusText } from '@shared/workflow/statuses';
import { completeApplication } from '../factories/request-rows';
import { gpsTiff, heicWithPosition, solidPng, withPngMetadata } from '../factories/photo-images';
import { appUrl, launchBrowser, signInAs } from '../setup/browser';

let session: Awaited<ReturnType<typeof launchBrowser>>;
beforeAll(async () => {
  session = await launchBrowser();
});
afterAll(() => session?.close());

async function personPage(email: string, name?: string): Promise<{ context: BrowserContext; page: Page }> {
  const context = await session.browser.newContext();
  const page = await context.newPage();
  await signInAs(page, email, name);
  return { context, page };
}

/** The API calls the wizard makes, through the signed-in browser's own cookies. */
async function draftThroughApi(page: Page, complete: boolean) {
  const created = await (await page.request.post(appUrl('/api/requests'), { data: {} })).json();
  const { site, entrance } = completeApplication();
  const saved = await page.request.patch(appUrl(`/api/requests/${created.request.id}/draft`), {
    data: complete
      ? { expectedVersion: 1, wizardStep: 3, site, entrance }
      : { expectedVersion: 1, wizardStep: 2, site },
  });
  return (await saved.json()).request as { id: string; version: number };
}

describe('after sending: the office asks, the owner answers', () => {
  it('shows the question, takes the answer, keeps internal notes out and other people away', async () => {
    const owner = await personPage(`ada.quist-${randomUUID().slice(0, 6)}@example.test`, 'Ada Quist');
    const draft = await draftThroughApi(owner.page, true);
    const sent = await (
      await owner.page.request.post(appUrl(`/api/requests/${draft.id}/transitions`), {
        data: { action: 'submit', expectedVersion: draft.version },
      })
    ).json();

    const office = await personPage('priya.lindqvist@gradepass.test');
    const api = (path: string, data: object) =>
      office.page.request.post(appUrl(`/api/requests/${draft.id}${path}`), { data });
    expect(
      (await api('/messages', { body: 'Pipe on the plan looks too small', visibility: 'internal' })).status(),
    ).toBe(201);
    expect((await api('/messages', { body: 'Thanks, we have your photos.', visibility: 'shared' })).status()).toBe(201);
    expect(
      (
        await api('/transitions', {
          action: 'ask-details',
          expectedVersion: sent.request.version,
          note: 'Is the culvert pipe metal or plastic?',
        })
      ).status(),
    ).toBe(200);

    await owner.page.goto(appUrl(`/my/requests/${draft.id}`));
    await owner.page.getByText('More details needed').first().waitFor();
    await owner.page.getByText('Is the culvert pipe metal or plastic?').first().waitFor();
    await owner.page.getByText('Thanks, we have your photos.').waitFor();
    expect(await owner.page.getByText('Pipe on the plan looks too small').count()).toBe(0);
    await owner.page.getByLabel('Your answer').fill('Corrugated metal, about a foot across.');
    await owner.page.getByRole('button', { name: 'Send my answer' }).click();
    await owner.page.getByText(statusText.submitted.next).waitFor();
    expect(await owner.page.getByLabel('Your answer').count()).toBe(0);
    await owner.page
      .getByRole('list', { name: 'Messages' })
      .getByText('Corrugated metal, about a foot across.')
      .waitFor();

    const neighbour = await personPage(`lev.amsel-${randomUUID().slice(0, 6)}@example.test`, 'Lev Amsel');
    await neighbour.page.goto(appUrl(`/my/requests/${draft.id}`));
    await neighbour.page.getByText('Request was not found.').waitFor();
    expect(await neighbour.page.getByText('Sent to the office').count()).toBe(0);
    for (const p of [owner, office, neighbour]) await p.context.close();
  });

  it('takes the server’s objections back to the step and the field they name', async () => {
    const owner = await personPage(`odo.fenn-${randomUUID().slice(0, 6)}@example.test`, 'Odo Fenn');
    const created = await (await owner.page.request.post(appUrl('/api/requests'), { data: {} })).json();
    const { entrance } = completeApplication();
    // A draft that reached the last step without a usable address, as an older or altered client could leave it.
    await owner.page.request.patch(appUrl(`/api/requests/${created.request.id}/draft`), {
      data: {
        expectedVersion: 1,
        wizardStep: 3,
        site: {
          address: '12',
          roadName: 'Fallow Lane',
          roadOwner: 'town',
          positionKind: 'landmark',
          landmark: 'the oak',
          distanceFromLandmarkFt: 30,
        },
        entrance,
      },
    });
    await owner.page.goto(appUrl(`/my/requests/${created.request.id}/edit`));
    await owner.page.getByRole('button', { name: 'Send to the office' }).click();
    await owner.page.getByRole('heading', { name: /Step 1 of 4/ }).waitFor();
    await owner.page.getByText('Enter the street address of the property.').waitFor();
    await expect
      .poll(() =>
        owner.page.getByLabel('Street address of the property').evaluate((el) => el === document.activeElement),
      )
      .toBe(true);
    await owner.context.close();
  });

  it('says when a photo upload fails and lets it be retried', async () => {
    const owner = await personPage(`ida.brenn-${randomUUID().slice(0, 6)}@example.test`, 'Ida Brenn');
    const draft = await draftThroughApi(owner.page, false);
    let storageDown = true;
    // Storage unreachable for a while: every attempt fails until it comes back.
    await owner.page.route(
      (url) => url.searchParams.has('X-Amz-Signature'),
      (route) => (storageDown ? route.abort('connectionrefused') : route.continue()),
    );
    await owner.page.goto(appUrl(`/my/requests/${draft.id}/edit`));
    await owner.page.getByRole('heading', { name: /Step 3 of 4/ }).waitFor();
    await owner.page
      .locator('.uppy-Dashboard-input')
      .first()
      .setInputFiles([{ name: 'road-right.png', mimeType: 'image/png', buffer: solidPng(20, 20, [90, 90, 90]) }]);
    await owner.page.getByText('A photo did not arrive').first().waitFor({ timeout: 60_000 });
    storageDown = false;
    await owner.page
      .getByRole('button', { name: /Try (sending it )?again/ })
      .first()
      .click();
    await owner.page.getByText('1 photo', { exact: true }).waitFor({ timeout: 30_000 });
    await owner.context.close();
  });

  it('offers the position from a HEIC and a PNG, then stores both without their metadata', async () => {
    const owner = await personPage(`eli.varga-${randomUUID().slice(0, 6)}@example.test`, 'Eli Varga');
    const draft = await draftThroughApi(owner.page, false);
    // A made-up site position (demo scenario).
    const heic = heicWithPosition(43.90127, -72.34051);
    const png = withPngMetadata(solidPng(24, 18, [70, 110, 60]), 43.90127, -72.34051);
    await owner.page.goto(appUrl(`/my/requests/${draft.id}/edit`));
    await owner.page.getByRole('heading', { name: /Step 3 of 4/ }).waitFor();
    await owner.page
      .locator('.uppy-Dashboard-input')
      .first()
      .setInputFiles([
        { name: 'entrance.heic', mimeType: 'image/heic', buffer: heic.file },
        { name: 'culvert.png', mimeType: 'image/png', buffer: png },
      ]);
    await owner.page.getByText('2 photos').waitFor({ timeout: 30_000 });
    await owner.page.getByRole('button', { name: 'Use this position' }).waitFor();
    await owner.page.getByText('This browser cannot show HEIC photos.').waitFor();

    const listed = (await (await owner.page.request.get(appUrl(`/api/requests/${draft.id}/photos`))).json()).photos as {
      fileName: string;
      url: string;
      gpsLat: number | null;
    }[];
    const stored = async (name: string) =>
      Buffer.from(await (await fetch(listed.find((p) => p.fileName === name)!.url)).arrayBuffer());
    const storedHeic = await stored('entrance.heic');
    expect(storedHeic.length).toBe(heic.file.length);
    expect(storedHeic.includes(gpsTiff(43.90127, -72.34051))).toBe(false);
    expect(storedHeic.subarray(heic.pictureAt, heic.pictureAt + heic.picture.length).equals(heic.picture)).toBe(true);
    const storedPng = await stored('culvert.png');
    for (const chunk of ['eXIf', 'tEXt', 'iTXt', 'tIME'])
      expect(storedPng.includes(Buffer.from(chunk, 'latin1'))).toBe(false);
    expect(listed.every((p) => p.gpsLat !== null && Math.abs(p.gpsLat - 43.90127) < 1e-4)).toBe(true);
    await owner.context.close();
  });
});
