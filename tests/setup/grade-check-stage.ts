import { eq } from 'drizzle-orm';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, inject } from 'vitest';
import { createDb } from '../../server/db/client';
import { jurisdictions } from '../../server/db/schema';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { ensurePerson } from '../factories/people';
import { createRequestRow, type RequestRow } from '../factories/request-rows';
import { launchBrowser } from './browser';

export interface GradeCheckStage {
  session: Awaited<ReturnType<typeof launchBrowser>>;
  db: ReturnType<typeof createDb>;
  request: RequestRow;
}

/**
 * For a browser test of the grade check screen: a browser, the seeded app's database, and a visit-booked request of
 * a demo owner in the named demo jurisdiction. The fields are filled before the file's tests run.
 */
export function gradeCheckStage(jurisdictionSlug: string): GradeCheckStage {
  const stage = {} as GradeCheckStage;
  beforeAll(async () => {
    stage.session = await launchBrowser();
    stage.db = createDb(inject('stack').adminDatabaseUrl.replace(/\/postgres$/, '/gradepass_e2e'), { max: 2 });
    const owner = await ensurePerson(stage.db.db, demoPeople.filter((p) => p.role === 'applicant')[1]);
    const [place] = await stage.db.db.select().from(jurisdictions).where(eq(jurisdictions.slug, jurisdictionSlug));
    stage.request = await createRequestRow(stage.db.db, {
      applicantId: owner.id,
      status: 'visit_booked',
      jurisdictionId: place.id,
      visitAt: new Date(),
    });
  });
  afterAll(async () => {
    await stage.db?.pool.end();
    await stage.session?.close();
  });
  return stage;
}

/** A survey whose landing climbs 5.5% for 20 ft, then 12% to the end: tab-separated as a spreadsheet copies it. */
export const surveyedCentreline = [
  'Station\tElevation',
  '0+00\t100.00',
  '0+10\t100.55',
  '0+20\t101.10',
  '0+40\t103.50',
  '0+60\t105.90',
  '0+80\t108.30',
].join('\n');

/** Pastes a centreline into the grade check screen the way an office clerk does from a spreadsheet. */
export async function pasteCentreline(page: Page, text = surveyedCentreline) {
  await page.getByText('Paste from a spreadsheet').click();
  await page.getByLabel('Pasted centreline').fill(text);
  await page.getByRole('button', { name: 'Use the pasted rows' }).click();
}
