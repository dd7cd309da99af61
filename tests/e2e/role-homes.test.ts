import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { launchBrowser, saveScreenshot, signInAs, signOut } from '../setup/browser';

let session: Awaited<ReturnType<typeof launchBrowser>>;
beforeAll(async () => {
  session = await launchBrowser();
});
afterAll(() => session?.close());

const homes = [
  { role: 'applicant', path: '/my/requests', heading: 'My requests' },
  { role: 'staff', path: '/office/queue', heading: 'Queue' },
  { role: 'crew', path: '/crew/board', heading: 'Released jobs' },
  { role: 'admin', path: '/office/queue', heading: 'Queue' },
] as const;

describe('each role signs in through the picker and lands on its own home', () => {
  for (const home of homes) {
    it(`${home.role} lands on ${home.path}`, async () => {
      const person = demoPeople.find((p) => p.role === home.role)!;
      const context = await session.browser.newContext();
      const page = await context.newPage();
      await signInAs(page, person.email);
      await page.waitForURL((url) => url.pathname === home.path);
      await expect.poll(() => page.getByRole('heading', { level: 1 }).first().textContent()).toContain(home.heading);
      await expect.poll(() => page.getByText(person.name).first().isVisible()).toBe(true);
      if (home.role === 'admin') {
        expect(await page.getByRole('link', { name: 'Users and roles' }).isVisible()).toBe(true);
      } else {
        expect(await page.getByRole('link', { name: 'Users and roles' }).count()).toBe(0);
      }
      await saveScreenshot(page, `home-${home.role}`);
      await signOut(page);
      await context.close();
    });
  }
});

describe('the admin adds a person', () => {
  it('is told at the E-mail field when that e-mail already belongs to someone', async () => {
    const admin = demoPeople.find((p) => p.role === 'admin')!;
    const owner = demoPeople.find((p) => p.role === 'applicant')!;
    const context = await session.browser.newContext();
    const page = await context.newPage();
    await signInAs(page, admin.email);
    await page.waitForURL((url) => url.pathname === '/office/queue');
    await page.getByRole('link', { name: 'Users and roles' }).click();
    const email = page.getByRole('textbox', { name: 'E-mail', exact: true });
    await page.getByRole('textbox', { name: 'Name', exact: true }).fill('Someone Else');
    await email.fill(owner.email);
    await page.getByRole('button', { name: 'Add person' }).click();
    await expect
      .poll(() => page.getByRole('alert').first().textContent())
      .toContain(`E-mail: ${owner.email} already belongs to ${owner.name}`);
    expect(await email.getAttribute('aria-invalid')).toBe('true');
    await saveScreenshot(page, 'users-duplicate-email');
    await context.close();
  });
});
