import { eq } from 'drizzle-orm';
import type { AsBuiltPageView } from '@shared/crew/crew-views';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDb } from '../../server/db/client';
import { requests } from '../../server/db/schema';
import { designWords } from '../../src/features/jobs/components/reading-checks';
import { appUrl, launchBrowser, signInAs } from '../setup/browser';
import { expectScreenClean, newSizedContext, watchConsole } from '../setup/page-checks';

/** The crew lead sees what each station should be built to; the office reads every reading of the set. */
let session: Awaited<ReturnType<typeof launchBrowser>>;
let jobId: string;
beforeAll(async () => {
  session = await launchBrowser();
  const db = createDb(inject('stack').adminDatabaseUrl.replace(/\/postgres$/, '/gradepass_e2e'), { max: 1 });
  // The seeded job under way, held by Jo Haverford, with a designed profile in its saved check.
  [{ id: jobId }] = await db.db
    .select({ id: requests.id })
    .from(requests)
    .where(eq(requests.siteAddress, '3187 Stonecrop Pike, Marrow Crossing'));
  await db.pool.end();
});
afterAll(() => session?.close());

describe('as-built readings beside the design', () => {
  it('shows the design elevation and grade at each typed station, and every saved reading in a table', async () => {
    const context = await newSizedContext(session.browser, 'phone');
    const page = await context.newPage();
    const heard = watchConsole(page);
    await signInAs(page, 'jo.haverford@gradepass.test');
    const view = (await (await page.request.get(appUrl(`/api/crew/jobs/${jobId}/as-built`))).json()) as AsBuiltPageView;
    expect(view.design).not.toBeNull();
    const basis = { ruleProfile: view.ruleProfile, design: view.design, roadEdgeStationFt: view.roadEdgeStationFt };

    await page.goto(appUrl(`/crew/jobs/${jobId}/as-built`));
    await page.getByLabel('Station 1', { exact: true }).fill('0+10');
    await page.getByLabel('Grade %').first().fill('3.5');
    const first = designWords(basis, 10);
    expect(first).toMatch(/^Design here: \d+\.\d\d ft, grade −?\d+\.\d%$/);
    await page.getByText(first, { exact: true }).waitFor();
    await page.getByRole('button', { name: 'Add a reading' }).click();
    await page.getByLabel('Station 2', { exact: true }).fill('0+30');
    await page.getByLabel('Reading is').nth(1).selectOption('elevation');
    await page.getByLabel('Elevation ft').fill('102.1');
    await page.getByText(designWords(basis, 30), { exact: true }).waitFor();
    await page.getByRole('button', { name: 'Save this set' }).click();
    await page.getByText('Set saved').waitFor();

    // Both readings are in the set's table, passing or not, each with the design beside it.
    const table = page.getByRole('table', { name: 'Every reading in the latest set, by station' });
    await table.waitFor();
    const rows = table.locator('tbody tr');
    await expect.poll(() => rows.count()).toBe(2);
    expect(await rows.nth(0).textContent()).toContain('0+10');
    expect(await rows.nth(0).textContent()).toContain('grade 3.50%');
    expect(await rows.nth(1).textContent()).toContain('elevation 102.10 ft');
    expect(await rows.nth(1).textContent()).toContain(designWords(basis, 30).replace('Design here: ', ''));
    await expectScreenClean(page, heard, 'as-built-beside-design-phone');
    await context.close();
  });
});
