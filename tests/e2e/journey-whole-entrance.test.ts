import { randomUUID } from 'node:crypto';
import { mkdirSync, readdirSync, rmSync } from 'node:fs';
import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { StoredMessage } from '../../fakes';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { solidPng } from '../factories/photo-images';
import {
  appUrl,
  caughtMail,
  launchBrowser,
  saveScreenshot,
  screenshotPath,
  signInAs,
  siteJpeg,
} from '../setup/browser';

/**
 * One driveway entrance from the first form to the closed request, through the real screens of all three roles,
 * with the homeowner's inbox in the mail catcher checked at the end. A screenshot is kept of every screen passed.
 */
let session: Awaited<ReturnType<typeof launchBrowser>>;
beforeAll(async () => {
  // Screens are numbered in the order passed; a previous run's numbering must not linger beside this one's.
  const dir = path.dirname(screenshotPath('x'));
  mkdirSync(dir, { recursive: true });
  for (const name of readdirSync(dir)) if (/^journey-\d{2}-/.test(name)) rmSync(path.join(dir, name));
  session = await launchBrowser();
});
afterAll(() => session?.close());

const staff = demoPeople.find((p) => p.role === 'staff')!;
const crewLead = demoPeople.find((p) => p.role === 'crew')!;
const owner = { email: `odette.ferncastle-${randomUUID().slice(0, 6)}@example.test`, name: 'Odette Ferncastle' };
const address = '4 Tamarack Bend, Marrow Crossing';
let shots = 0;

const shot = (page: Page, name: string) => saveScreenshot(page, `journey-${String(++shots).padStart(2, '0')}-${name}`);

async function as(browser: Browser, email: string, name?: string, viewport = { width: 1366, height: 900 }) {
  const context = await browser.newContext({ viewport });
  const page = await context.newPage();
  await signInAs(page, email, name);
  return { page, close: () => context.close() };
}

async function inbox(address: string): Promise<StoredMessage[]> {
  return (await caughtMail())
    .filter((m) => m.to.some((to) => to.toLowerCase() === address.toLowerCase()))
    .sort((a, b) => a.receivedAt.localeCompare(b.receivedAt) || a.id.localeCompare(b.id));
}

/** Waits until the homeowner has received `count` e-mails, so each step's e-mail is known to arrive in its turn. */
const received = (count: number) =>
  expect
    .poll(async () => (await inbox(owner.email)).length, { timeout: 30_000, interval: 300 })
    .toBeGreaterThanOrEqual(count);

const sitePhoto = (page: Page) => siteJpeg(page, 44.1802, -72.6411);

/**
 * An office action from the workspace's "Next step" panel, filled by `fill` and sent with its own button; done
 * when the request's status badge shows the new status in plain words.
 */
async function officeAction(
  page: Page,
  label: string,
  to: string,
  fill?: (form: ReturnType<Page['getByRole']>) => Promise<void>,
) {
  await page.getByRole('button', { name: label, exact: true }).click();
  const form = page.getByRole('form', { name: label });
  if (fill) await fill(form);
  await form.getByRole('button', { name: label }).click();
  try {
    await page
      .locator('section', { has: page.getByRole('heading', { name: 'At a glance' }) })
      .getByText(to, { exact: true })
      .waitFor();
  } catch (error) {
    await page.screenshot({ path: screenshotPath(`journey-failed-${label.replaceAll(' ', '-')}`), fullPage: true });
    throw error;
  }
}

const isoDay = (offsetDays: number) => new Date(Date.now() + offsetDays * 86_400_000).toISOString().slice(0, 10);

describe('the whole journey of one entrance', () => {
  it('applicant applies, office checks and releases, a crew builds and verifies, office closes; every e-mail arrives in order', async () => {
    // The homeowner applies, with photos.
    const applicant = await as(session.browser, owner.email, owner.name);
    let page = applicant.page;
    await page.waitForURL((u) => u.pathname === '/my/requests');
    await shot(page, 'applicant-my-requests');
    await page.getByRole('link', { name: 'Start a new request' }).click();
    await page.getByRole('button', { name: 'Start the form' }).click();
    await page.waitForURL(/\/my\/requests\/[0-9a-f-]+\/edit$/);
    await page.getByLabel('Street address of the property').fill(address);
    await page.getByLabel('Road the entrance joins').fill('Sawmill Flats Road');
    await page.getByLabel('The county').check();
    await page.getByLabel('Posted speed limit, mph (if known)').fill('40');
    await page.getByLabel('Landmark', { exact: true }).fill('the grey silo');
    await page.getByLabel('Distance from the landmark, ft').fill('310');
    await shot(page, 'applicant-wizard-site');
    await page.getByRole('button', { name: 'Save and continue' }).click();
    await page.getByRole('heading', { name: /Step 2 of 4/ }).waitFor();
    await page.getByLabel('A new entrance').check();
    await page.getByLabel('A home').check();
    await page.getByLabel('Cars and pickups').check();
    await page.getByLabel('An open ditch, no pipe').check();
    await page.getByLabel('When would you like the work done?').selectOption('within_3_months');
    await page
      .getByLabel('Anything else the office should know? (optional)')
      .fill('Power line crosses 30 ft in; the gate sticks.');
    await shot(page, 'applicant-wizard-entrance');
    await page.getByRole('button', { name: 'Save and continue' }).click();
    await page.getByRole('heading', { name: /Step 3 of 4/ }).waitFor();
    await page
      .locator('.uppy-Dashboard-input')
      .first()
      .setInputFiles([
        { name: 'from-the-road.jpg', mimeType: 'image/jpeg', buffer: await sitePhoto(page) },
        { name: 'ditch-line.png', mimeType: 'image/png', buffer: solidPng(48, 32, [110, 90, 58]) },
      ]);
    await page.getByText('2 photos').waitFor({ timeout: 30_000 });
    await page.getByRole('button', { name: 'Use this position' }).click();
    await page.getByText('The site position is now set from your photo.').waitFor();
    await shot(page, 'applicant-wizard-photos');
    await page.getByRole('button', { name: 'Save and continue' }).click();
    await page.getByRole('heading', { name: /Step 4 of 4/ }).waitFor();
    await shot(page, 'applicant-wizard-review');
    await page.getByRole('button', { name: 'Send to the office' }).click();
    await page.waitForURL(/\/my\/requests\/[0-9a-f-]{36}$/);
    const requestId = new URL(page.url()).pathname.split('/').pop()!;
    const reference = (await page
      .getByText(/Reference GP-\d{4}-\d{5}/)
      .first()
      .textContent())!.match(/GP-\d{4}-\d{5}/)![0];
    await shot(page, 'applicant-request-sent');
    await received(1);

    // The office books the visit, surveys, checks and attaches, records the permit and releases the job.
    const office = await as(session.browser, staff.email, undefined, { width: 1440, height: 1000 });
    page = office.page;
    await page.goto(appUrl('/office/queue'));
    await page.getByRole('link', { name: reference }).waitFor();
    await shot(page, 'office-queue');
    await page.getByRole('link', { name: reference }).click();
    await page.getByRole('heading', { name: reference }).waitFor();
    await shot(page, 'office-workspace-submitted');
    await officeAction(page, 'Book the site visit', 'Site visit booked', (form) =>
      form.getByLabel('Date and time of the site visit').fill(`${isoDay(2)}T09:30`),
    );
    await received(2);

    await page.getByRole('link', { name: 'Survey and grade check' }).click();
    await page.waitForURL((u) => u.pathname.endsWith('/grade-check'));
    const marrow = (await page.locator('option', { hasText: 'Marrow County' }).first().textContent())!;
    await page.getByLabel("Road authority's rule profile").selectOption({ label: marrow });
    await page.getByText('Paste from a spreadsheet').click();
    await page
      .getByLabel('Pasted centreline')
      .fill(
        [
          'Station\tElevation',
          '0+00\t100.00',
          '0+10\t100.55',
          '0+20\t101.10',
          '0+40\t103.50',
          '0+60\t105.90',
          '0+80\t108.30',
        ].join('\n'),
      );
    await page.getByRole('button', { name: 'Use the pasted rows' }).click();
    await page.getByLabel('Road grade at the entrance (%)').fill('1.5');
    await page.getByLabel('Sight distance measured left (ft)').fill('650');
    await page.getByLabel('Sight distance measured right (ft)').fill('600');
    await page.getByRole('button', { name: 'Add a stake' }).click();
    await page.getByLabel('Stake, stake 1').fill('Landing left');
    await page.getByLabel('Offset right of CL (ft), stake 1').fill('-6');
    await page.getByLabel('From the road edge (ft), stake 1').fill('10');
    await page.getByLabel('Rod reading (ft), stake 1').fill('5.62');
    await page.getByRole('button', { name: 'Suggest a compliant profile' }).click();
    await page.getByRole('button', { name: 'Apply the suggested profile' }).click();
    await expect.poll(() => page.getByTestId('live-verdict').getAttribute('data-passes')).toBe('true');
    await shot(page, 'office-grade-check');
    await page.getByRole('button', { name: 'Save this check' }).click();
    await page.getByText('Saved as check 1.').waitFor();
    await page.getByRole('button', { name: 'Attach check 1' }).click();
    await page.getByRole('list', { name: 'Saved checks' }).getByText('Attached').waitFor();
    await page.getByRole('button', { name: 'Mark grade check done' }).click();
    await page.getByText('Grade check done').first().waitFor();
    await shot(page, 'office-grade-check-attached');
    await received(3);

    // A fresh load: the workspace's cached copy of the request does not yet know the check screen marked it checked.
    await page.goto(appUrl(`/office/requests/${requestId}`));
    await page.getByRole('heading', { name: reference }).waitFor();
    await officeAction(page, 'Record permit filed', 'Permit filed', (form) =>
      form.getByLabel('Permit reference').fill('MC-DA-2026-0412'),
    );
    await received(4);
    await officeAction(page, 'Record permit granted', 'Permit granted', async (form) => {
      await form.getByLabel('Decided on').fill(isoDay(0));
      await form
        .getByLabel('Conditions (optional)')
        .fill('Cones and a flagger on Sawmill Flats Road; county inspection of the culvert before backfill.');
      await form.getByLabel('Permit expires on (optional)').fill(isoDay(180));
    });
    await received(5);
    await officeAction(page, 'Release to crews', 'Ready for a crew');
    await shot(page, 'office-released');
    await received(6);

    // The crew lead takes it, plans the day, builds, records the finished grades and marks it built.
    const crew = await as(session.browser, crewLead.email, undefined, { width: 412, height: 915 });
    page = crew.page;
    await page.goto(appUrl('/crew/board'));
    const card = page.getByRole('article').filter({ hasText: reference });
    await card.waitFor();
    expect(await card.textContent()).toContain('MC-DA-2026-0412');
    await shot(page, 'crew-board');
    await card.getByRole('button', { name: 'Take this job' }).click();
    await page.waitForURL((u) => u.pathname === '/crew/my-jobs');
    await received(7);
    const mine = page.getByRole('article').filter({ hasText: reference });
    await mine.getByLabel('Work day').fill(isoDay(5));
    await mine.getByLabel('Note for the homeowner (optional)').fill('We start at 7:30; please leave the gate open.');
    await mine.getByRole('button', { name: 'Plan this day' }).click();
    await mine.getByText(/The homeowner has been e-mailed/).waitFor();
    await shot(page, 'crew-my-jobs-planned');
    await received(8);
    await page.goto(appUrl(`/crew/jobs/${requestId}/field-sheet`));
    await page.getByRole('heading', { name: new RegExp(`Field sheet · ${reference}`) }).waitFor();
    await shot(page, 'crew-field-sheet');
    await page.goto(appUrl('/crew/my-jobs'));
    const jobCard = page.getByRole('article').filter({ hasText: reference });
    await jobCard.getByRole('button', { name: 'Start work' }).click();
    await jobCard.getByRole('button', { name: 'Yes, start work' }).click();
    await page.getByRole('region', { name: 'Under way' }).getByText(reference).waitFor();
    await received(9);
    await page
      .getByRole('region', { name: 'Under way' })
      .getByRole('article')
      .filter({ hasText: reference })
      .getByRole('link', { name: 'Enter as-built readings' })
      .click();
    await page.getByLabel('Station 1', { exact: true }).fill('0+05');
    await page.getByLabel('Grade %').first().fill('3.1');
    await page.getByRole('button', { name: 'Add a reading' }).click();
    await page.getByLabel('Station 2', { exact: true }).fill('0+15');
    await page.getByLabel('Grade %').nth(1).fill('3.4');
    await page.getByRole('button', { name: 'Add a reading' }).click();
    await page.getByLabel('Station 3', { exact: true }).fill('0+50');
    await page.getByLabel('Grade %').nth(2).fill('11.8');
    await expect.poll(() => page.getByText('PASS', { exact: true }).count()).toBeGreaterThanOrEqual(3);
    await shot(page, 'crew-as-built');
    await page.getByRole('button', { name: 'Save this set' }).click();
    await page.getByText('Set saved').waitFor();
    await page.getByRole('button', { name: 'Mark built' }).click();
    await page.waitForURL((u) => u.pathname === '/crew/my-jobs');
    await page.getByRole('region', { name: 'Built, with the office' }).getByText(reference).waitFor();
    await shot(page, 'crew-my-jobs-built');
    await received(10);

    // The office reviews the as-built set and closes the request.
    page = office.page;
    await page.goto(appUrl(`/office/requests/${requestId}`));
    await page.getByRole('heading', { name: 'As-built grades from the crew' }).waitFor();
    await shot(page, 'office-as-built-review');
    await officeAction(page, 'Close the request', 'Finished');
    await shot(page, 'office-closed');
    await received(11);

    page = applicant.page;
    await page.goto(appUrl(`/my/requests/${requestId}`));
    await page.getByText('Finished').first().waitFor();
    const timeline = page.getByRole('list', { name: 'Timeline' });
    await timeline.getByText(/Work planned for/).waitFor();
    await timeline.getByText('Finished').waitFor();
    const photos = page.getByRole('img', { name: /from-the-road|ditch-line/ });
    await expect
      .poll(() =>
        photos.evaluateAll(
          (imgs) => imgs.length === 2 && imgs.every((img) => (img as HTMLImageElement).naturalWidth > 0),
        ),
      )
      .toBe(true);
    await shot(page, 'applicant-finished');

    const subjects = (await inbox(owner.email)).map((m) => m.subject);
    expect(subjects).toEqual([
      `We received your request ${reference}`,
      `${reference}: Site visit booked`,
      `${reference}: Grade check done`,
      `${reference}: Permit filed`,
      `${reference}: Permit granted`,
      `${reference}: Ready for a crew`,
      `${reference}: Crew assigned`,
      expect.stringMatching(new RegExp(`^${reference}: work planned for `)),
      `${reference}: Being built`,
      `${reference}: Built, being reviewed`,
      `${reference}: Finished`,
    ]);
    await Promise.all([applicant.close(), office.close(), crew.close()]);
  });
});
