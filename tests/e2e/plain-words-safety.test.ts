import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDb } from '../../server/db/client';
import { photos, users } from '../../server/db/schema';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { createRequestRow, type RequestRow } from '../factories/request-rows';
import { appUrl, launchBrowser, saveScreenshot, signInAs } from '../setup/browser';

const staff = demoPeople.find((p) => p.role === 'staff')!;
const owner = demoPeople.find((p) => p.role === 'applicant')!;

let session: Awaited<ReturnType<typeof launchBrowser>>;
let seeded: ReturnType<typeof createDb>;
let request: RequestRow;

beforeAll(async () => {
  session = await launchBrowser();
  seeded = createDb(inject('stack').adminDatabaseUrl.replace(/\/postgres$/, '/gradepass_e2e'), { max: 2 });
  const [applicant] = await seeded.db.select().from(users).where(eq(users.email, owner.email));
  request = await createRequestRow(seeded.db, {
    applicantId: applicant.id,
    applicantName: owner.name,
    siteAddress: '14 Larkspur Bend, Fenwick Falls',
  });
});
afterAll(async () => {
  await session?.close();
  await seeded?.pool.end();
});

describe('photos are judged by their contents, in plain words', () => {
  it('refuses a text file named .jpg and an empty file once each, before anything is sent or counted', async () => {
    const page = await (await session.browser.newContext()).newPage();
    await signInAs(page, owner.email);
    await page.goto(appUrl(`/my/requests/${request.id}`));
    const input = page.locator('.uppy-Dashboard-input').first();
    await input.waitFor({ state: 'attached' });
    // The photo box speaks our words, not the widget's.
    await page.getByText('Drop photos here or').waitFor();
    expect(await page.getByText('browse files').count()).toBe(0);

    await input.setInputFiles([
      { name: 'road-left.jpg', mimeType: 'image/jpeg', buffer: Buffer.from('These are my notes, not a photo.\n') },
    ]);
    await page
      .getByText('“road-left.jpg” is not a photo: its contents are not a JPEG, PNG, WebP or HEIC image')
      .waitFor();
    await input.setInputFiles([{ name: 'empty.jpg', mimeType: 'image/jpeg', buffer: Buffer.alloc(0) }]);
    await page.getByText('“empty.jpg” is empty (0 bytes)').waitFor();
    await input.setInputFiles([{ name: 'notes.txt', mimeType: 'text/plain', buffer: Buffer.from('hello') }]);
    await page.getByText('“notes.txt” is not a photo').waitFor();
    await page.waitForTimeout(300);
    expect(await page.getByText('“notes.txt” is not a photo').count()).toBe(1);
    expect(await page.getByText('sizeBytes').count()).toBe(0);
    expect(await page.getByRole('button', { name: /Try again|Retry/ }).count()).toBe(0);
    await saveScreenshot(page, 'photo-refusals');
    // Nothing was registered with the server.
    const rows = await seeded.db.select().from(photos).where(eq(photos.requestId, request.id));
    expect(rows).toHaveLength(0);
  });
});

describe("the office's message switch", () => {
  it('names the audience on the button and returns to internal after a shared message', async () => {
    const page = await (await session.browser.newContext()).newPage();
    await signInAs(page, staff.email);
    await page.goto(appUrl(`/office/requests/${request.id}?tab=messages`));
    const form = page.getByRole('form', { name: 'Write a message' });
    await form.waitFor();
    await form.getByRole('button', { name: 'Save internal note' }).waitFor();
    await form.getByLabel('Shared with the homeowner').check();
    await form.getByLabel('Message').fill('We will visit on Thursday morning.');
    await form.getByRole('button', { name: 'Send to the homeowner' }).click();
    await page.getByRole('list', { name: 'Messages' }).getByText('We will visit on Thursday morning.').waitFor();
    await form.getByRole('button', { name: 'Save internal note' }).waitFor();
    expect(await form.getByLabel('Internal note (office only)').isChecked()).toBe(true);
    await saveScreenshot(page, 'message-switch-back-to-internal');
  });
});
