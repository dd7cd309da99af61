import path from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { inject } from 'vitest';
import { chromiumPath } from './browser-tools';

/** Debian's Chromium, never a downloaded one; the flags keep it off the network this machine does not have. */
export async function launchBrowser(): Promise<{ browser: Browser; close(): Promise<void> }> {
  // Playwright gives every launch a fresh, throwaway profile of its own.
  const browser = await chromium.launch({
    executablePath: chromiumPath,
    headless: true,
    args: [
      '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking',
      '--disable-component-update', '--disable-sync',
    ],
  });
  return { browser, close: () => browser.close() };
}

export function appUrl(pathname = '/') {
  const { appUrl: base } = inject('stack');
  if (!base) throw new Error('The browser project did not start the app (stack.appUrl missing).');
  return new URL(pathname, base).toString();
}

/** Signs in the way a person does: the app's button, then the provider's identity picker. */
export async function signInAs(page: Page, email: string, name?: string) {
  await page.goto(appUrl('/sign-in'));
  await page.getByRole('link', { name: 'Sign in with Google' }).click();
  const listed = page.getByRole('button', { name: new RegExp(email.replace(/[.*+?^${}()|[\]\\]/g, '\\$&'), 'i') });
  if (await listed.count()) {
    await listed.first().click();
  } else {
    await page.getByLabel(/e-mail/i).fill(email);
    if (name) await page.getByLabel(/name/i).fill(name);
    await page.getByRole('button', { name: /sign in|continue/i }).click();
  }
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in') && url.origin === new URL(appUrl()).origin);
}

export function screenshotPath(name: string) {
  return path.join(inject('stack').artifactsDir, 'screenshots', `${name}.png`);
}

export async function signOut(page: Page) {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.waitForURL(appUrl('/'));
}
