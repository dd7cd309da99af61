import { eq } from 'drizzle-orm';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDb } from '../../server/db/client';
import { jobs, requests } from '../../server/db/schema';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { createReleasedJob } from '../factories/crew-jobs';
import { createAsBuiltSet } from '../factories/grade-checks';
import { ensurePerson } from '../factories/people';
import { appUrl, launchBrowser, saveScreenshot, signInAs, siteJpeg } from '../setup/browser';

/** A job the crew has built with passing readings; the crew adds a photo, the office sends the inspector's link. */
let session: Awaited<ReturnType<typeof launchBrowser>>;
let db: ReturnType<typeof createDb>;
let jobId: string;
const staff = demoPeople.filter((p) => p.role === 'staff')[0];
const crewLead = demoPeople.find((p) => p.role === 'crew')!;

beforeAll(async () => {
  session = await launchBrowser();
  db = createDb(inject('stack').adminDatabaseUrl.replace(/\/postgres$/, '/gradepass_e2e'), { max: 2 });
  const applicant = await ensurePerson(
    db.db,
    demoPeople.find((p) => p.role === 'applicant')!,
  );
  const office = await ensurePerson(db.db, staff);
  const crew = await ensurePerson(db.db, crewLead);
  const job = await createReleasedJob(db.db, { applicantId: applicant.id, staffId: office.id });
  jobId = job.id;
  await db.db.update(requests).set({ status: 'built', crewId: crew.id }).where(eq(requests.id, job.id));
  await db.db
    .update(jobs)
    .set({ crewId: crew.id, acceptedAt: new Date(), startedAt: new Date(), builtAt: new Date() })
    .where(eq(jobs.requestId, job.id));
  const reading = (stationFt: number, measured: number, limit: number, ruleId: string) => ({
    stationFt,
    ruleId,
    measured,
    limit,
    unit: '%',
    status: 'pass',
    margin: limit - measured,
  });
  await createAsBuiltSet(db.db, {
    requestId: job.id,
    gradeCheckId: job.gradeCheckId,
    crewId: crew.id,
    passed: true,
    readings: [
      { stationFt: 5, gradePercent: 3.9 },
      { stationFt: 40, gradePercent: 12 },
    ],
    results: {
      readings: [reading(5, 3.9, 4, 'landing.maxGradePercent'), reading(40, 12, 15, 'maxGradePercent')],
      status: 'pass',
    },
    note: 'Apron paved to the road edge; both ditch lines reshaped and seeded.',
  });
});
afterAll(async () => {
  await db?.pool.end();
  await session?.close();
});

/** Errors printed by the page or thrown in it, and failed answers: the test fails on any. */
function watchConsole(page: Page) {
  const noise: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error') noise.push(`${m.type()}: ${m.text()}`);
  });
  page.on('response', (r) => {
    if (r.status() >= 400) noise.push(`${r.status()} ${r.url()}`);
  });
  page.on('pageerror', (e) => noise.push(`pageerror: ${e.message}`));
  return noise;
}

const sideways = (page: Page) =>
  page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);

describe('the road authority inspector’s page', () => {
  it('the crew adds a photo, the office sends the link, the inspector reads it at phone size and passes it', async () => {
    // The crew lead photographs the finished entrance from the as-built page.
    const crewContext = await session.browser.newContext({ viewport: { width: 390, height: 844 } });
    const crewPage = await crewContext.newPage();
    await signInAs(crewPage, crewLead.email);
    const crewNoise = watchConsole(crewPage);
    await crewPage.goto(appUrl(`/crew/jobs/${jobId}/as-built`));
    await crewPage.getByLabel('What the photo shows').selectOption('finished_entrance');
    await crewPage.getByLabel('Caption (optional)').fill('Finished apron from the road');
    const jpeg = await siteJpeg(crewPage, 44.2104, -72.5871);
    await crewPage
      .getByLabel('Photo', { exact: true })
      .setInputFiles({ name: 'IMG_2231.jpg', mimeType: 'image/jpeg', buffer: jpeg });
    // The photo goes through the phone's send queue: kept first, then sent at once while there is a signal.
    await crewPage.getByRole('button', { name: 'Add the photo' }).click();
    await crewPage.getByRole('list', { name: 'Crew photos' }).getByText('Finished apron from the road').waitFor();
    await crewContext.close();
    expect(crewNoise).toEqual([]);

    // The office sends the inspector a link from the request.
    const officeContext = await session.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const officePage = await officeContext.newPage();
    await signInAs(officePage, staff.email);
    await officePage.goto(appUrl(`/office/requests/${jobId}`));
    await officePage.getByLabel('Inspector’s name').fill('Hollis Varga');
    await officePage.getByLabel('Inspector’s e-mail').fill('h.varga@harlow-township.test');
    await officePage.getByRole('button', { name: 'E-mail the link' }).click();
    await officePage.getByText('Link e-mailed to h.varga@harlow-township.test.').waitFor();
    const link = (await officePage.locator('.font-mono', { hasText: '/inspect/' }).textContent())!.trim();
    expect(link).toContain(`/inspect/${jobId}#t=`);
    await saveScreenshot(officePage, 'inspector-link-sent-office');

    // The inspector opens it on a phone: no account, no sideways scrolling.
    const phone = await session.browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true });
    const inspector = await phone.newPage();
    const noise = watchConsole(inspector);
    await inspector.goto(link);
    await inspector.getByRole('heading', { level: 1 }).waitFor();
    await inspector.getByText(/township inspection before paving/).waitFor();
    await inspector.getByText('Overall: Pass', { exact: false }).waitFor();
    await inspector.getByText('Apron paved to the road edge', { exact: false }).waitFor();
    const photo = inspector.getByRole('img', { name: 'Finished entrance: Finished apron from the road' });
    await photo.waitFor();
    await expect.poll(() => photo.evaluate((img) => (img as HTMLImageElement).naturalWidth)).toBeGreaterThan(0);
    await inspector.getByText(/taken at 44\.210/).waitFor();
    expect(await sideways(inspector)).toBeLessThanOrEqual(0);
    await saveScreenshot(inspector, 'inspector-page-phone');

    await inspector.getByRole('radio', { name: 'Passed' }).check();
    await inspector.getByLabel('Your name').fill('Hollis Varga');
    await inspector.getByRole('button', { name: 'Record the outcome' }).click();
    await inspector.getByText('An outcome was recorded through this link. Thank you.').waitFor();
    await inspector.getByText(/Passed · Hollis Varga/).waitFor();
    expect(await sideways(inspector)).toBeLessThanOrEqual(0);
    await saveScreenshot(inspector, 'inspector-page-phone-passed');
    expect(noise).toEqual([]);

    // The office sees the outcome; a link cut short opens nothing.
    await officePage.reload();
    await officePage.getByText(/Passed · Hollis Varga/).waitFor();
    await inspector.goto(link.slice(0, -4));
    await inspector.reload();
    await inspector.getByText('This inspection link does not open a page.').waitFor();
    await phone.close();
    await officeContext.close();
  });
});
