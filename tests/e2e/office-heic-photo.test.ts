import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { heicWithPosition } from '../factories/photo-images';
import { completeApplication } from '../factories/request-rows';
import { appUrl, launchBrowser, saveScreenshot, signInAs } from '../setup/browser';

let session: Awaited<ReturnType<typeof launchBrowser>>;
beforeAll(async () => {
  session = await launchBrowser();
});
afterAll(() => session?.close());

describe('a HEIC photo in a browser that cannot draw it', () => {
  it('says so on the owner’s page, in the office grid and in the viewer, which offers the file', async () => {
    const ownerContext = await session.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const owner = await ownerContext.newPage();
    await signInAs(owner, `orla.pike-${randomUUID().slice(0, 6)}@example.test`, 'Orla Pike');
    // The wizard's own API calls, then a real presigned upload of a HEIC file (a made-up site position).
    const created = (await (await owner.request.post(appUrl('/api/requests'), { data: {} })).json()).request;
    const { site, entrance } = completeApplication();
    const draft = (
      await (
        await owner.request.patch(appUrl(`/api/requests/${created.id}/draft`), {
          data: { expectedVersion: 1, wizardStep: 3, site, entrance },
        })
      ).json()
    ).request;
    const heic = heicWithPosition(43.9, -72.3).file;
    const ticket = await (
      await owner.request.post(appUrl(`/api/requests/${draft.id}/photos`), {
        data: { fileName: 'entrance.heic', contentType: 'image/heic', sizeBytes: heic.length },
      })
    ).json();
    expect((await fetch(ticket.upload.url, { method: 'PUT', headers: ticket.upload.headers, body: heic })).status).toBe(
      200,
    );
    expect(
      (
        await owner.request.post(appUrl(`/api/requests/${draft.id}/photos/${ticket.photo.id}/confirm`), {
          data: { gpsLat: null, gpsLng: null },
        })
      ).status(),
    ).toBe(200);
    expect(
      (
        await owner.request.post(appUrl(`/api/requests/${draft.id}/transitions`), {
          data: { action: 'submit', expectedVersion: draft.version },
        })
      ).status(),
    ).toBe(200);

    await owner.goto(appUrl(`/my/requests/${draft.id}`));
    await owner.getByText('This browser cannot show HEIC photos.').waitFor();
    await owner.getByRole('link', { name: /Open entrance\.heic/ }).waitFor();

    const staffContext = await session.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const staff = await staffContext.newPage();
    await signInAs(staff, demoPeople.find((p) => p.role === 'staff')!.email);
    await staff.goto(appUrl(`/office/requests/${draft.id}?tab=photos`));
    const grid = staff.getByRole('button', { name: /entrance\.heic/ });
    await grid.getByText('This browser cannot show HEIC photos.').waitFor();
    await grid.click();
    const viewer = staff.getByRole('dialog', { name: 'Photo viewer' });
    await viewer.getByText('This browser cannot show HEIC photos.').waitFor();
    expect(await viewer.getByRole('link', { name: 'Open entrance.heic' }).getAttribute('href')).toContain(
      'X-Amz-Signature',
    );
    await saveScreenshot(staff, 'office-heic-viewer');
    await ownerContext.close();
    await staffContext.close();
  });
});
