import { writeFileSync } from 'node:fs';
import { PDFParse } from 'pdf-parse';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { and, eq } from 'drizzle-orm';
import { createDb } from '../../server/db/client';
import { emails, messages } from '../../server/db/schema';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { saveYard } from '../../server/services/crew/yard.service';
import { createReleasedJob } from '../factories/crew-jobs';
import { ensurePerson } from '../factories/people';
import { appUrl, launchBrowser, saveScreenshot, screenshotPath, signInAs } from '../setup/browser';

/** The crew lead's side on its own: a job released straight into the running app's database, taken and built. */
let session: Awaited<ReturnType<typeof launchBrowser>>;
let db: ReturnType<typeof createDb>;
let jobId: string;
let address: string;
beforeAll(async () => {
  session = await launchBrowser();
  db = createDb(inject('stack').adminDatabaseUrl.replace(/\/postgres$/, '/gradepass_e2e'), { max: 2 });
  const applicant = await ensurePerson(
    db.db,
    demoPeople.find((p) => p.role === 'applicant')!,
  );
  const staff = await ensurePerson(
    db.db,
    demoPeople.find((p) => p.role === 'staff')!,
  );
  const job = await createReleasedJob(db.db, {
    applicantId: applicant.id,
    staffId: staff.id,
    siteLat: 44.1,
    siteLng: -72.6,
  });
  jobId = job.id;
  address = job.siteAddress;
  await db.db.insert(messages).values({
    requestId: job.id,
    authorId: applicant.id,
    visibility: 'shared',
    body: 'The septic lid is left of the entrance; please keep off it.',
  });
  // The same yard the owner's test types in, so the distance on the board holds whichever test runs first.
  await saveYard(db.db, { label: 'Marrow Crossing yard', lat: 44, lng: -72.6 });
});
afterAll(async () => {
  await db?.pool.end();
  await session?.close();
});

const shot = (page: Page, name: string) => saveScreenshot(page, `journey-crew-${name}`);

const crewLead = demoPeople.filter((p) => p.role === 'crew')[0];

describe('a crew lead takes, plans, builds and verifies a released job', () => {
  it('the owner sets the yard the board measures distances from', async () => {
    const context = await session.browser.newContext();
    const page = await context.newPage();
    await signInAs(page, demoPeople.find((p) => p.role === 'admin')!.email);
    await page.goto(appUrl('/crew/board'));
    await page.getByLabel('Yard name').fill('Marrow Crossing yard');
    await page.getByLabel('Latitude').fill('44.0');
    await page.getByLabel('Longitude').fill('east');
    await page.getByRole('button', { name: 'Save the yard' }).click();
    await page
      .getByText('longitude is between -180 and 180')
      .or(page.getByText(/must be a number/))
      .first()
      .waitFor();
    await page.getByLabel('Longitude').fill('-72.6');
    await page.getByRole('button', { name: 'Save the yard' }).click();
    await page.getByText('Yard saved').waitFor();
    expect(await page.getByRole('button', { name: 'Take this job' }).count()).toBe(0);
    await shot(page, 'owner-yard');
    await context.close();
  });

  it('works through the board, my jobs, the field sheet and the as-built screen', async () => {
    const context = await session.browser.newContext({
      viewport: { width: 412, height: 915 },
      isMobile: true,
      hasTouch: true,
    });
    const page = await context.newPage();
    await signInAs(page, crewLead.email);
    await page.goto(appUrl('/crew/board'));
    const card = page
      .getByRole('article')
      .filter({ hasText: address })
      .filter({ has: page.getByText(/HT-ACC-/) })
      .last();
    await card.waitFor();
    await page.getByRole('button', { name: 'Nearest the yard first' }).click();
    await card.getByText('6.9 miles in a straight line').waitFor();
    await shot(page, 'board');
    await card.getByRole('button', { name: 'Take this job' }).click();
    await page.waitForURL((u) => u.pathname === '/crew/my-jobs');

    const mine = page.getByRole('article').filter({ hasText: address }).first();
    const date = new Date(Date.now() + 7 * 86_400_000).toISOString().slice(0, 10);
    await mine.getByLabel('Work day').fill(date);
    await mine.getByRole('button', { name: 'Plan this day' }).click();
    // The demo crew has planned jobs of its own: every step is read on this job's own card.
    const planned = page.getByRole('region', { name: 'Planned' }).getByRole('article').filter({ hasText: address });
    await planned.getByText(/The homeowner has been e-mailed/).waitFor();
    await shot(page, 'my-jobs-planned');
    // Starting work asks first; nothing moves until the crew lead says yes.
    await planned.getByRole('button', { name: 'Start work' }).click();
    await page.getByText(/The homeowner and the office are told the crew is building/).waitFor();
    await page.getByRole('button', { name: 'Yes, start work' }).click();
    // The job itself under way, not only the section: leaving before the answer would drop the start.
    await page.getByRole('region', { name: 'Under way' }).getByText(address).first().waitFor();

    await page.goto(appUrl(`/crew/jobs/${jobId}/field-sheet`));
    await page.getByRole('heading', { name: /Field sheet/ }).waitFor();
    expect(await page.getByText('rising away from the road').count()).toBeGreaterThan(0);
    expect(await page.getByText(/buried utilities/).isVisible()).toBe(true);
    // The crew holding the job reads the owner's messages under the sheet and answers them.
    const talk = page.locator('section', {
      has: page.getByRole('heading', { name: 'Messages with the homeowner and the office' }),
    });
    await talk.getByText('The septic lid is left of the entrance; please keep off it.').waitFor();
    await talk
      .getByLabel('Write to the homeowner and the office')
      .fill('Noted: we will stake the lid before the machine arrives.');
    await talk.getByRole('button', { name: 'Send message' }).click();
    await talk.getByText('Noted: we will stake the lid before the machine arrives.').waitFor();
    await expect
      .poll(
        async () =>
          (
            await db.db
              .select({ to: emails.toAddress })
              .from(emails)
              .where(and(eq(emails.requestId, jobId), eq(emails.template, 'message.shared')))
          ).length,
      )
      .toBe(2);
    await shot(page, 'field-sheet-phone');
    await page.setViewportSize({ width: 1280, height: 900 });
    await shot(page, 'field-sheet');
    await page.emulateMedia({ media: 'print' });
    const pdf = await page.pdf({ format: 'Letter', printBackground: true });
    writeFileSync(screenshotPath('journey-crew-field-sheet-print').replace(/png$/, 'pdf'), pdf);
    const parser = new PDFParse({ data: pdf });
    const info = await parser.getInfo();
    await parser.destroy();
    expect(info.total).toBe(1);
    await page.emulateMedia({ media: 'screen' });

    await page.setViewportSize({ width: 412, height: 915 });
    await page.goto(appUrl(`/crew/jobs/${jobId}/as-built`));
    const stationBox = (n: number) => page.getByLabel(`Station ${n}`, { exact: true });
    await stationBox(1).fill('0+05');
    await page.getByLabel('Grade %').first().fill('4');
    await page.getByText('PASS').first().waitFor();
    await page.getByRole('button', { name: 'Add a reading' }).click();
    await stationBox(2).fill('0+40');
    await page.getByLabel('Grade %').nth(1).fill('15.51');
    await page.getByText('FAIL').first().waitFor();
    await page.getByLabel('Grade %').nth(1).fill('15.4');
    await page.getByText(/CLOSE/).first().waitFor();
    await shot(page, 'as-built-entry');
    await page.getByRole('button', { name: 'Save this set' }).click();
    await page.getByText('Set saved').waitFor();
    // The saved readings stay in the form: one is corrected and the set saved again, the first kept as it was.
    expect(await stationBox(1).inputValue()).toBe('0+05');
    expect(await page.getByLabel('Grade %').nth(1).inputValue()).toBe('15.4');
    await page.getByLabel('Grade %').nth(1).fill('14.8');
    await page.getByRole('button', { name: 'Save the corrected set' }).click();
    await page.getByText(/^Corrects the set of /).waitFor();
    await page.getByText(/^Corrected by the set of /).waitFor();
    await shot(page, 'as-built-corrected');
    await page.reload();
    expect(await page.getByLabel('Grade %').nth(1).inputValue()).toBe('14.8');
    await page.getByRole('button', { name: 'Mark built' }).click();
    await page.waitForURL((u) => u.pathname === '/crew/my-jobs');
    await page.getByRole('region', { name: 'Built, with the office' }).getByText(address).first().waitFor();
    await shot(page, 'my-jobs-built');
    await context.close();
  });
});
