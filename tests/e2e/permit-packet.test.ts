import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDb } from '../../server/db/client';
import { jurisdictions, requests } from '../../server/db/schema';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { ensurePerson } from '../factories/people';
import { createRequestRow, type RequestRow } from '../factories/request-rows';
import { appUrl, launchBrowser, saveScreenshot, screenshotPath, signInAs } from '../setup/browser';

let session: Awaited<ReturnType<typeof launchBrowser>>;
let db: ReturnType<typeof createDb>;
let request: RequestRow;
const applicant = demoPeople.filter((p) => p.role === 'applicant')[0];
const staff = demoPeople.filter((p) => p.role === 'staff')[0];

beforeAll(async () => {
  session = await launchBrowser();
  db = createDb(inject('stack').adminDatabaseUrl.replace(/\/postgres$/, '/gradepass_e2e'), { max: 2 });
  const owner = await ensurePerson(db.db, applicant);
  const [marrow] = await db.db.select().from(jurisdictions).where(eq(jurisdictions.slug, 'marrow-county'));
  request = await createRequestRow(db.db, {
    applicantId: owner.id,
    applicantName: applicant.name,
    status: 'visit_booked',
    jurisdictionId: marrow.id,
    visitAt: new Date(),
  });
});
afterAll(async () => {
  await db?.pool.end();
  await session?.close();
});

const centreline = [
  'Station\tElevation',
  '0+00\t100.00',
  '0+10\t100.55',
  '0+20\t101.10',
  '0+40\t103.50',
  '0+60\t105.90',
  '0+80\t108.30',
].join('\n');

describe('the plan view and the permit packet', () => {
  it('draws the plan view live as the survey is typed, north arrow only once a bearing is given', async () => {
    const context = await session.browser.newContext({ viewport: { width: 1440, height: 1000 } });
    const page = await context.newPage();
    await signInAs(page, staff.email);
    await page.goto(appUrl(`/office/requests/${request.id}/grade-check`));
    await page.getByText('Paste from a spreadsheet').click();
    await page.getByLabel('Pasted centreline').fill(centreline);
    await page.getByRole('button', { name: 'Use the pasted rows' }).click();
    await page.getByLabel('Sight distance measured left (ft)').fill('650');
    await page.getByLabel('Sight distance measured right (ft)').fill('600');
    const plan = page.getByTestId('plan-view');
    await plan.getByText('Looking left: 650 ft measured').waitFor();
    expect(await plan.locator('[data-role="north"]').count()).toBe(0);
    await plan.getByText('Right-of-way line not shown').waitFor();

    await page.getByLabel('Right-of-way line from the road edge (ft)').fill('17');
    await page.getByLabel('Driveway bearing (degrees from north)').fill('35');
    await page.getByLabel('Flare radius (ft)').fill('10');
    await page.getByLabel('To the nearest intersection (ft)').fill('300');
    await page.getByLabel('Nearest intersection lies').selectOption('left');
    await plan.getByText('Right-of-way line, 17 ft from road edge').waitFor();
    await plan.getByText('Nearest intersection, 300 ft').waitFor();
    expect(await plan.locator('[data-role="north"]').count()).toBe(1);
    await plan.scrollIntoViewIfNeeded();
    await plan.screenshot({ path: screenshotPath('plan-view-on-screen') });
    await saveScreenshot(page, 'plan-view-workspace');
    await context.close();
  });

  it('gives the office the packet of a demo request at Letter and at A4, each on its own paper', async () => {
    const [filed] = await db.db.select().from(requests).where(eq(requests.status, 'permit_filed'));
    expect(filed).toBeDefined();
    const context = await session.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    await signInAs(page, staff.email);
    await page.goto(appUrl(`/office/requests/${filed.id}`));
    const panel = page
      .getByRole('region', { name: 'Permit' })
      .or(page.locator('section', { hasText: 'Read the permit packet' }));
    const link = page.getByRole('link', { name: 'Read the permit packet (PDF)' });
    await link.waitFor();
    await saveScreenshot(page, 'permit-panel');
    expect(await panel.count()).toBeGreaterThan(0);

    const dir = path.dirname(screenshotPath('permit-packet-letter'));
    mkdirSync(dir, { recursive: true });
    const expected = { letter: [612, 792], a4: [595.28, 841.89] } as const;
    for (const paper of ['letter', 'a4'] as const) {
      await page.getByLabel('Packet paper size').selectOption(paper);
      const href = await link.getAttribute('href');
      expect(href).toContain(`paper=${paper}`);
      const answer = await page.request.get(appUrl(href!));
      expect(answer.status()).toBe(200);
      expect(answer.headers()['content-type']).toBe('application/pdf');
      const bytes = await answer.body();
      const media = /\/MediaBox \[0 0 ([\d.]+) ([\d.]+)\]/.exec(bytes.toString('latin1'));
      expect(media && [Number(media[1]), Number(media[2])]).toEqual(expected[paper]);
      const pdfPath = path.join(dir, `permit-packet-${paper}.pdf`);
      writeFileSync(pdfPath, bytes);
      if (existsSync('/usr/bin/pdftoppm'))
        execFileSync('/usr/bin/pdftoppm', ['-png', '-r', '70', pdfPath, path.join(dir, `permit-packet-${paper}`)]);
    }
    await context.close();
  });
});
