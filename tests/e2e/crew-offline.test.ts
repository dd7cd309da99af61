import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { and, eq } from 'drizzle-orm';
import type { BrowserContext, Page } from 'playwright-core';
import { createDb } from '../../server/db/client';
import { asBuiltSets, photos } from '../../server/db/schema';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { createReleasedJob } from '../factories/crew-jobs';
import { ensurePerson } from '../factories/people';
import { appUrl, launchBrowser, saveScreenshot, signInAs, siteJpeg, watchConsole } from '../setup/browser';

/**
 * A crew lead at a site with no signal: the job was opened once with a connection; then the phone goes offline,
 * readings and a photo are entered and the page reloaded; the connection returns and everything arrives once.
 */
let session: Awaited<ReturnType<typeof launchBrowser>>;
let db: ReturnType<typeof createDb>;
const crewLead = demoPeople.filter((p) => p.role === 'crew')[1];

beforeAll(async () => {
  session = await launchBrowser();
  db = createDb(inject('stack').adminDatabaseUrl.replace(/\/postgres$/, '/gradepass_e2e'), { max: 2 });
});
afterAll(async () => {
  await db?.pool.end();
  await session?.close();
});

async function releasedJob() {
  const applicant = await ensurePerson(
    db.db,
    demoPeople.find((p) => p.role === 'applicant')!,
  );
  const staff = await ensurePerson(
    db.db,
    demoPeople.find((p) => p.role === 'staff')!,
  );
  return createReleasedJob(db.db, { applicantId: applicant.id, staffId: staff.id, siteLat: 44.2, siteLng: -72.5 });
}

/** The crew lead's own status changes, sent from the page as its buttons send them (same origin, same session). */
async function post(page: Page, path: string, body: object) {
  const answer = await page.evaluate(
    async ([p, b]) => {
      const r = await fetch(p as string, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', Accept: 'application/json' },
        body: JSON.stringify(b),
      });
      return { status: r.status, body: await r.json() };
    },
    [path, body] as const,
  );
  expect(answer.status, JSON.stringify(answer.body)).toBe(200);
  return answer.body as { request: { version: number } };
}

async function takeAndStart(page: Page, job: { id: string; version: number }) {
  await post(page, `/api/crew/jobs/${job.id}/accept`, { expectedVersion: job.version });
  return post(page, `/api/crew/jobs/${job.id}/start`, { expectedVersion: job.version + 1 });
}

/** Waits until the service worker controls the page, so what the page reads from now on is kept for offline. */
async function underServiceWorker(page: Page) {
  await page.evaluate(() => navigator.serviceWorker.ready);
  await expect.poll(() => page.evaluate(() => navigator.serviceWorker.controller !== null)).toBe(true);
}

const setsOf = (requestId: string) => db.db.select().from(asBuiltSets).where(eq(asBuiltSets.requestId, requestId));
const photosOf = (requestId: string) =>
  db.db
    .select()
    .from(photos)
    .where(and(eq(photos.requestId, requestId), eq(photos.kind, 'finished_entrance')));

/** A phone signed in as the crew lead; console errors are watched from the app on (not the sign-in stand-in's page). */
async function phone(): Promise<{ context: BrowserContext; page: Page; errors: string[] }> {
  const context = await session.browser.newContext({ viewport: { width: 412, height: 915 }, isMobile: true });
  const page = await context.newPage();
  await signInAs(page, crewLead.email, crewLead.name);
  return { context, page, errors: watchConsole(page) };
}

describe('the crew lead works a job with no signal', () => {
  it('readings and a photo entered offline survive a reload and arrive exactly once when the signal returns', async () => {
    const job = await releasedJob();
    const { context, page, errors } = await phone();
    await takeAndStart(page, job);

    // With a connection: the app installs its worker, then the job's field sheet and as-built page are read once.
    await page.goto(appUrl(`/crew/jobs/${job.id}/as-built`));
    await underServiceWorker(page);
    await page.goto(appUrl(`/crew/jobs/${job.id}/field-sheet`));
    await page.getByRole('heading', { name: /Field sheet/ }).waitFor();
    await page.goto(appUrl(`/crew/jobs/${job.id}/as-built`));
    await page.getByRole('heading', { name: /As-built grades/ }).waitFor();
    const manifest = await page.evaluate(async () => (await fetch('/manifest.webmanifest')).json());
    expect(manifest).toMatchObject({ name: 'Gradepass', display: 'standalone' });

    // No signal. The page reloads from the phone alone.
    await context.setOffline(true);
    await page.reload();
    await page.getByRole('heading', { name: /As-built grades/ }).waitFor();
    await page.getByText(/^No connection\./).waitFor();

    await page.getByLabel('Station 1', { exact: true }).fill('0+05');
    await page.getByLabel('Grade %').first().fill('3.5');
    await page.getByRole('button', { name: 'Add a reading' }).click();
    await page.getByLabel('Station 2', { exact: true }).fill('0+40');
    await page.getByLabel('Grade %').nth(1).fill('11');
    await page.getByRole('button', { name: 'Save this set' }).click();
    await page.getByText('Set kept on this phone').waitFor();
    await page.getByText('Waiting to send: 2 readings').waitFor();

    const jpeg = await siteJpeg(page, 44.2001, -72.5002);
    await page.getByLabel('Photo', { exact: true }).setInputFiles({
      name: 'finished-entrance.jpg',
      mimeType: 'image/jpeg',
      buffer: jpeg,
    });
    await page.getByLabel('Caption (optional)').fill('Finished apron from the road');
    await page.getByRole('button', { name: 'Add the photo' }).click();
    await page.getByText('Waiting to send: 2 readings, 1 photo').waitFor();
    await saveScreenshot(page, 'crew-offline-waiting');

    // A reload offline keeps the queue, and the field sheet still opens.
    await page.goto(appUrl(`/crew/jobs/${job.id}/field-sheet`));
    await page.getByRole('heading', { name: /Field sheet/ }).waitFor();
    await page.getByText('Waiting to send: 2 readings, 1 photo').waitFor();
    await page.goto(appUrl(`/crew/jobs/${job.id}/as-built`));
    await page.getByText('Waiting to send: 2 readings, 1 photo').waitFor();
    expect(await setsOf(job.id)).toHaveLength(0);
    expect(await photosOf(job.id)).toHaveLength(0);

    // The first answer the server gives for the readings is lost on the way back: the set is stored but the phone
    // never hears it, so it sends it again under the same key.
    let lost = 0;
    await context.route(`**/api/crew/jobs/${job.id}/as-built`, async (route) => {
      if (route.request().method() !== 'POST' || lost > 0) return route.fallback();
      lost += 1;
      await route.fetch();
      await route.abort('connectionreset');
    });

    await context.setOffline(false);
    await expect.poll(() => page.getByText(/Waiting to send/).count(), { timeout: 60_000 }).toBe(0);
    expect(lost).toBe(1);
    const sets = await setsOf(job.id);
    expect(sets).toHaveLength(1);
    expect(sets[0].readings).toEqual([
      { stationFt: 5, gradePercent: 3.5 },
      { stationFt: 40, gradePercent: 11 },
    ]);
    const stored = await photosOf(job.id);
    expect(stored).toHaveLength(1);
    expect(stored[0]).toMatchObject({ status: 'stored', caption: 'Finished apron from the road' });
    expect(stored[0].gpsLat).toBeCloseTo(44.2001, 3);
    // The page shows the set the server checked, and nothing more is sent on another reload.
    await page.reload();
    await page.getByRole('heading', { name: /As-built grades/ }).waitFor();
    await page.getByText('Saved sets').waitFor();
    expect(await setsOf(job.id)).toHaveLength(1);
    expect(await photosOf(job.id)).toHaveLength(1);
    await saveScreenshot(page, 'crew-offline-sent');
    expect(errors.filter((e) => !/ERR_CONNECTION_RESET/.test(e))).toEqual([]);
    await context.close();
  });

  it('a set the server refuses is kept and said plainly; the crew lead sends it again or deletes it', async () => {
    const job = await releasedJob();
    const { context, page, errors } = await phone();
    const started = await takeAndStart(page, job);
    await page.goto(appUrl(`/crew/jobs/${job.id}/as-built`));
    await underServiceWorker(page);
    await page.reload();
    await page.getByRole('heading', { name: /As-built grades/ }).waitFor();

    // A first set, sent with the signal, lets the job be marked built.
    await page.getByLabel('Station 1', { exact: true }).fill('0+05');
    await page.getByLabel('Grade %').first().fill('3');
    await page.getByRole('button', { name: 'Save this set' }).click();
    await page.getByText('Set saved').waitFor();
    // The saved set stays in the form to be corrected; this is a new one.
    await page.getByRole('button', { name: 'Start an empty set' }).click();

    await context.setOffline(true);
    await page.getByLabel('Station 1', { exact: true }).fill('0+10');
    await page.getByLabel('Grade %').first().fill('3.2');
    await page.getByRole('button', { name: 'Save this set' }).click();
    await page.getByText('Waiting to send: 1 reading').waitFor();

    // Meanwhile the job is marked built from another phone: readings are no longer taken.
    const other = await session.browser.newContext();
    const otherPage = await other.newPage();
    await signInAs(otherPage, crewLead.email, crewLead.name);
    await post(otherPage, `/api/crew/jobs/${job.id}/mark-built`, { expectedVersion: started.request.version });
    await other.close();

    await context.setOffline(false);
    const held = page.getByRole('alert').filter({ hasText: 'Not sent, kept on this phone: 1 reading' });
    await held.waitFor({ timeout: 60_000 });
    await held.getByText(/this one is "Built/).waitFor();
    await held.getByText(/10 ft: 3\.2%/).waitFor();
    await saveScreenshot(page, 'crew-offline-refused');
    expect(await setsOf(job.id)).toHaveLength(1);

    // Sent again while it is still refused: still kept. Then deleted, with a second tap.
    await held.getByRole('button', { name: 'Send it again' }).click();
    await held.getByText(/this one is "Built/).waitFor();
    await held.getByRole('button', { name: 'Delete it…' }).click();
    await held.getByRole('button', { name: 'Yes, delete it from this phone' }).click();
    await expect.poll(() => page.getByText('Not sent, kept on this phone').count()).toBe(0);
    expect(await setsOf(job.id)).toHaveLength(1);
    expect(errors.filter((e) => !/status of 409/.test(e))).toEqual([]);
    await context.close();
  });
});
