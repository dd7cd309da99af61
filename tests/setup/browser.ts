import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { inject } from 'vitest';
import type { StoredMessage } from '../../fakes';
import { withGpsExif } from '../factories/photo-images';
import { chromiumPath } from './browser-tools';

/** Debian's Chromium, never a downloaded one; the flags keep it off the network this machine does not have. */
export async function launchBrowser(): Promise<{ browser: Browser; close(): Promise<void> }> {
  // Playwright gives every launch a fresh, throwaway profile of its own.
  const browser = await chromium.launch({
    executablePath: chromiumPath,
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
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

/** Every message the mail catcher has received, oldest first. */
export async function caughtMail(): Promise<StoredMessage[]> {
  return (await (await fetch(`${inject('stack').mailWebUrl}/api/messages`)).json()) as StoredMessage[];
}

/** A full-page screenshot under test-artifacts/screenshots/, for people to review what the test saw. */
export async function saveScreenshot(page: Page, name: string) {
  const file = screenshotPath(name);
  mkdirSync(path.dirname(file), { recursive: true });
  await page.screenshot({ path: file, fullPage: true });
}

/** A real JPEG of a site, encoded by the browser itself, then given the GPS block a phone camera writes. */
export async function siteJpeg(page: Page, lat: number, lng: number) {
  const dataUrl = await page.evaluate(() => {
    const canvas = document.createElement('canvas');
    canvas.width = 64;
    canvas.height = 40;
    const g = canvas.getContext('2d')!;
    g.fillStyle = '#7a9a6a';
    g.fillRect(0, 0, 64, 40);
    g.fillStyle = '#4b4b4b';
    g.fillRect(0, 26, 64, 14);
    return canvas.toDataURL('image/jpeg', 0.9);
  });
  return withGpsExif(Buffer.from(dataUrl.split(',')[1], 'base64'), lat, lng);
}

export async function signOut(page: Page) {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.waitForURL(appUrl('/'));
}

/**
 * Every console error and uncaught error of the page, for the test to hold to none (or to the ones it provoked on
 * purpose). Chromium reports a failed or refused request here too ("Failed to load resource ...").
 */
export function watchConsole(page: Page): string[] {
  const errors: string[] = [];
  page.on('console', (message) => {
    if (message.type() === 'error') errors.push(`${message.text()} (${message.location().url})`);
  });
  page.on('pageerror', (error) => errors.push(error.message));
  return errors;
}
