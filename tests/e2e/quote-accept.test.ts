import { eq } from 'drizzle-orm';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { gradeChecks, quotes, users } from '../../server/db/schema';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { currentRules, demoCheck, demoGround } from '../../server/dev/seed/demo-survey';
import { appUrl, caughtMail, saveScreenshot, signInAs } from '../setup/browser';
import { gradeCheckStage } from '../setup/grade-check-stage';

const stage = gradeCheckStage('marrow-county');
const staff = demoPeople.find((p) => p.role === 'staff')!;
const owner = demoPeople.filter((p) => p.role === 'applicant')[1];
const shot = (page: Page, name: string) => saveScreenshot(page, `quote-${name}`);

/** Console errors once signed in, other than the 400 a refused answer gets (the screen shows it beside its field). */
function watchConsole(page: Page) {
  const noise: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error' && !/status of 400/.test(m.text())) noise.push(m.text());
  });
  page.on('pageerror', (e) => noise.push(e.message));
  return noise;
}

async function saveDemoCheck() {
  const found = (await currentRules(stage.db.db, 'marrow-county'))!;
  const [office] = await stage.db.db.select().from(users).where(eq(users.email, staff.email));
  const check = await demoCheck(found.rules, {
    ground: demoGround(5.5, 11),
    speedMph: 40,
    sightLeftFt: 600,
    sightRightFt: 600,
    roadGradePercent: 1,
  });
  await stage.db.db.insert(gradeChecks).values({
    requestId: stage.request.id,
    number: 1,
    ruleProfileVersionId: found.versionId,
    ...check,
    createdById: office.id,
  });
}

describe('a quote from the office to the owner', () => {
  it('the office builds and sends a quote from the check; the owner reads it from the e-mail and accepts it', async () => {
    await saveDemoCheck();
    const [ownerRow] = await stage.db.db.select().from(users).where(eq(users.id, stage.request.applicantId));

    const office = await (
      await stage.session.browser.newContext({ viewport: { width: 1280, height: 1000 } })
    ).newPage();
    await signInAs(office, staff.email);
    const officeNoise = watchConsole(office);
    await office.goto(appUrl(`/office/requests/${stage.request.id}?tab=quote`));
    await office.getByRole('button', { name: 'Make a quote from check 1' }).click();
    await office.getByText('Draft version 1, from grade check 1').waitFor();
    const lines = office.getByRole('list', { name: 'Quote lines' }).getByRole('listitem');
    const firstCount = await lines.count();
    expect(firstCount).toBeGreaterThan(5);
    await expect.poll(() => office.getByText(/cut \d+ bank cy from check 1/).count()).toBeGreaterThan(0);

    // The office drops the optional paving and adds a line of its own.
    const paving = lines.filter({ has: office.locator('input[value^="Paving"]') });
    await paving.getByRole('button', { name: /Remove line/ }).click();
    await office.getByRole('button', { name: 'Add a line' }).click();
    const n = firstCount; // one removed, one added
    await office.getByLabel(`Description (line ${n})`).fill('Sawcut and patch the road edge');
    await office.getByLabel(`Quantity (line ${n})`).fill('16');
    await office.getByLabel(`Unit (line ${n})`).fill('ft');
    await office.getByLabel(`Unit price $ (line ${n})`).fill('12.345');
    await office.getByRole('button', { name: 'Save draft' }).click();
    await office.getByText('Unit price must be dollars and cents, zero or more (like 18.50)').waitFor();
    await office.getByLabel(`Unit price $ (line ${n})`).fill('12.50');
    await office.getByLabel('Terms').fill('Half the balance is due on the day the crew finishes.');
    await office.getByRole('button', { name: 'Save draft' }).click();
    await office.getByText('Draft saved.').waitFor();
    await shot(office, 'office-draft');

    const preview = office.getByRole('link', { name: 'Preview the PDF' });
    const pdf = await office.request.get(appUrl((await preview.getAttribute('href'))!));
    expect(pdf.status()).toBe(200);
    expect(pdf.headers()['content-type']).toContain('application/pdf');

    await office.getByRole('button', { name: 'Send to the owner…' }).click();
    await office.getByRole('button', { name: 'Yes, send version 1' }).click();
    await office.getByText(/Version 1: Sent, waiting for an answer \(current\)/).waitFor();
    await shot(office, 'office-sent');
    const [sent] = await stage.db.db.select().from(quotes).where(eq(quotes.requestId, stage.request.id));
    expect(sent.status).toBe('sent');
    expect((sent.lines as { description: string }[]).some((l) => l.description.startsWith('Paving'))).toBe(false);

    const findMail = async (to: string, words: string) =>
      (await caughtMail()).find((m) => m.to.some((a) => a.includes(to)) && m.subject.includes(words));
    await expect
      .poll(() => findMail(ownerRow.email, `${stage.request.reference}: your quote`), {
        timeout: 20_000,
        interval: 300,
      })
      .toBeTruthy();
    const mail = (await findMail(ownerRow.email, `${stage.request.reference}: your quote`))!;
    expect(mail.text).toContain('Sawcut and patch the road edge: $200.00');
    const href = /https?:\/\/\S+\/my\/requests\/[0-9a-f-]{36}/.exec(mail.text)?.[0];
    expect(href).toBeTruthy();

    const home = await (await stage.session.browser.newContext({ viewport: { width: 1280, height: 1000 } })).newPage();
    await signInAs(home, owner.email);
    const homeNoise = watchConsole(home);
    await home.goto(href!);
    await home.getByRole('heading', { name: 'Quote' }).waitFor();
    await home.getByText('Sawcut and patch the road edge').waitFor();
    await home.getByRole('link', { name: 'Ask the office a question about it' }).waitFor();
    await home.getByLabel('Your full name').fill('Someone Else');
    await home.getByRole('button', { name: /Accept version 1/ }).click();
    await home
      .getByText(`Your full name must match the name on the request (${stage.request.applicantName})`)
      .waitFor();
    await home.getByLabel('Your full name').fill(stage.request.applicantName);
    await home.getByRole('button', { name: /Accept version 1/ }).click();
    await home.getByText('You accepted version 1').waitFor();
    await shot(home, 'owner-accepted');

    const [accepted] = await stage.db.db.select().from(quotes).where(eq(quotes.id, sent.id));
    expect(accepted).toMatchObject({ status: 'accepted', acceptedName: stage.request.applicantName });
    await expect
      .poll(() => findMail('office@', `[${stage.request.reference}] Quote version 1 accepted`), {
        timeout: 20_000,
        interval: 300,
      })
      .toBeTruthy();
    await home.goto(appUrl(`/my/requests/${stage.request.id}`));
    await home.getByText('Quote accepted').first().waitFor();
    expect(officeNoise).toEqual([]);
    expect(homeNoise).toEqual([]);
  });
});
