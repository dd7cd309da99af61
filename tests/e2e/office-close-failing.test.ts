import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDb } from '../../server/db/client';
import { jobs, requests } from '../../server/db/schema';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { createReleasedJob } from '../factories/crew-jobs';
import { createAsBuiltSet } from '../factories/grade-checks';
import { ensurePerson } from '../factories/people';
import { appUrl, launchBrowser, saveScreenshot, signInAs } from '../setup/browser';

/** A job the crew marked built over failing as-built readings, with their explanation, waiting for the office. */
let session: Awaited<ReturnType<typeof launchBrowser>>;
let db: ReturnType<typeof createDb>;
let jobId: string;
const staff = demoPeople.filter((p) => p.role === 'staff')[0];

beforeAll(async () => {
  session = await launchBrowser();
  db = createDb(inject('stack').adminDatabaseUrl.replace(/\/postgres$/, '/gradepass_e2e'), { max: 2 });
  const applicant = await ensurePerson(
    db.db,
    demoPeople.find((p) => p.role === 'applicant')!,
  );
  const office = await ensurePerson(db.db, staff);
  const crew = await ensurePerson(
    db.db,
    demoPeople.find((p) => p.role === 'crew')!,
  );
  const job = await createReleasedJob(db.db, { applicantId: applicant.id, staffId: office.id });
  jobId = job.id;
  await db.db.update(requests).set({ status: 'built', crewId: crew.id }).where(eq(requests.id, job.id));
  await db.db
    .update(jobs)
    .set({ crewId: crew.id, acceptedAt: new Date(), startedAt: new Date(), builtAt: new Date() })
    .where(eq(jobs.requestId, job.id));
  await createAsBuiltSet(db.db, {
    requestId: job.id,
    gradeCheckId: job.gradeCheckId,
    crewId: crew.id,
    passed: false,
    readings: [{ stationFt: 5, gradePercent: 6.5 }],
    note: 'Ledge rock under the landing; the township inspector saw it.',
  });
});
afterAll(async () => {
  await db?.pool.end();
  await session?.close();
});

describe('closing a job built over failing readings', () => {
  it('warns the office, which must write why before it closes', async () => {
    const context = await session.browser.newContext({ viewport: { width: 1440, height: 1000 } });
    const page = await context.newPage();
    await signInAs(page, staff.email);
    await page.goto(appUrl(`/office/requests/${jobId}`));
    await page.getByRole('button', { name: 'Close the request', exact: true }).click();
    const form = page.getByRole('form', { name: 'Close the request' });
    await form.getByText(/last as-built readings fail the rule profile \(crew’s note: “Ledge rock/).waitFor();
    const note = form.getByLabel('Closing note');
    await expect(note.evaluate((el) => (el as HTMLTextAreaElement).required)).resolves.toBe(true);
    await saveScreenshot(page, 'office-close-failing-warning');
    await note.fill('The township accepted the landing as built on site.');
    await form.getByRole('button', { name: 'Close the request' }).click();
    await page
      .locator('section', { has: page.getByRole('heading', { name: 'At a glance' }) })
      .getByText('Finished', { exact: true })
      .waitFor();
    await context.close();
  });
});
