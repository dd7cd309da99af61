import { writeFileSync } from 'node:fs';
import { eq } from 'drizzle-orm';
import { PDFParse } from 'pdf-parse';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDb } from '../../server/db/client';
import { requests } from '../../server/db/schema';
import { appUrl, launchBrowser, screenshotPath, signInAs } from '../setup/browser';
import { newSizedContext } from '../setup/page-checks';

/** The crew's field sheet goes to site on one sheet of paper, whichever paper the printer holds. */
let session: Awaited<ReturnType<typeof launchBrowser>>;
let jobId: string;
beforeAll(async () => {
  session = await launchBrowser();
  const db = createDb(inject('stack').adminDatabaseUrl.replace(/\/postgres$/, '/gradepass_e2e'), { max: 1 });
  // The seeded job under way: a saved check with a design, both laser setups, stakes, a warp and a culvert.
  [{ id: jobId }] = await db.db
    .select({ id: requests.id })
    .from(requests)
    .where(eq(requests.siteAddress, '3187 Stonecrop Pike, Marrow Crossing'));
  await db.pool.end();
});
afterAll(() => session?.close());

async function printed(page: Page, format: 'Letter' | 'A4') {
  const pdf = await page.pdf({ format, printBackground: true });
  writeFileSync(screenshotPath(`field-sheet-print-${format}`).replace(/png$/, 'pdf'), pdf);
  const parser = new PDFParse({ data: pdf });
  const pages = (await parser.getInfo()).total;
  const text = (await parser.getText()).text;
  await parser.destroy();
  return { pages, text };
}

const occurrences = (text: string, words: string) => text.split(words).length - 1;
/** A heading stands on a line of its own; the plan view's labels may use the same word inside a longer line. */
const headingLines = (text: string, heading: string) => text.split('\n').filter((l) => l.trim() === heading).length;

describe('the field sheet printed', () => {
  for (const size of ['laptop', 'phone'] as const) {
    it(`fits one page at Letter and at A4, chart and stake table included, each table once (printed from a ${size})`, async () => {
      const context = await newSizedContext(session.browser, size);
      const page = await context.newPage();
      await signInAs(page, 'jo.haverford@gradepass.test');
      await page.goto(appUrl(`/crew/jobs/${jobId}/field-sheet`));
      await page.getByRole('heading', { name: /Field sheet/ }).waitFor();
      await page.emulateMedia({ media: 'print' });
      // What the sheet must carry on paper, read from the screen's own tables.
      const stakeLabels = await page
        .getByRole('table', { name: 'Stakes' })
        .locator('tbody tr td:first-child')
        .allTextContents();
      expect(stakeLabels.length).toBeGreaterThan(0);
      expect(await page.locator('article svg').count()).toBeGreaterThan(0);
      const headings = (await page.locator('article h2').allTextContents()).map((h) => h.trim());
      expect(headings).toEqual(expect.arrayContaining(['Laser', 'Design profile', 'Culvert']));
      for (const format of ['Letter', 'A4'] as const) {
        const { pages, text } = await printed(page, format);
        expect(pages, `${format} pages`).toBe(1);
        expect(text).toContain('Design profile');
        expect(text).toContain('Stakes');
        for (const label of stakeLabels) expect(text).toContain(label.trim());
        // The chart's own words (its legend) are on the paper, so the chart was drawn, not cut off.
        expect(text).toContain('Station (ft from the road edge)');
        // Every part once: a screen-only twin of a table must not reach the paper.
        for (const heading of headings) expect(headingLines(text, heading), heading).toBe(1);
        expect(occurrences(text, 'Cut and fill on the centreline')).toBe(1);
      }
      await context.close();
    });
  }
});
