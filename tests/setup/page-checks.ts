import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Browser, BrowserContext, Locator, Page } from 'playwright-core';
import { saveScreenshot } from './browser';

/** The two sizes every screen is walked at: a laptop and a phone held upright. */
export const screenSizes = {
  laptop: { width: 1366, height: 900 },
  phone: { width: 390, height: 844 },
} as const;
export type ScreenSize = keyof typeof screenSizes;

/** A browser context at one of the two sizes (the phone one touches and reports itself as mobile). */
export function newSizedContext(browser: Browser, size: ScreenSize): Promise<BrowserContext> {
  return browser.newContext(
    size === 'phone'
      ? { viewport: screenSizes.phone, isMobile: true, hasTouch: true }
      : { viewport: screenSizes.laptop },
  );
}

const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');

/**
 * Everything the page says on its console that a person would call noise: errors and warnings, uncaught errors,
 * and failed loads (a 404 favicon, a 401 the client did not expect). Start it before the first navigation.
 */
export function watchConsole(page: Page) {
  const noise: string[] = [];
  page.on('console', (message) => {
    if (message.type() === 'error' || message.type() === 'warning') {
      const where = message.location().url;
      noise.push(`${message.type()}: ${message.text()}${where ? ` (${where})` : ''}`);
    }
  });
  page.on('pageerror', (error) => noise.push(`uncaught: ${error.message}`));
  return {
    /** What was heard since the last take, emptied. */
    take: () => noise.splice(0, noise.length),
  };
}

export interface AxeFinding {
  id: string;
  impact: string;
  help: string;
  targets: string[];
}

/** axe-core run inside the page (evaluated, so the app's Content-Security-Policy does not stand in its way). */
export async function axeFindings(page: Page, impacts: string[] = ['serious', 'critical']): Promise<AxeFinding[]> {
  const hasAxe = await page.evaluate(() => 'axe' in window);
  if (!hasAxe) await page.evaluate(axeSource);
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run(o: object): Promise<{ violations: unknown[] }> } }).axe;
    const result = await axe.run({ resultTypes: ['violations'] });
    return result.violations as {
      id: string;
      impact: string | null;
      help: string;
      nodes: { target: unknown[] }[];
    }[];
  });
  return violations
    .filter((v) => impacts.includes(v.impact ?? ''))
    .map((v) => ({
      id: v.id,
      impact: v.impact ?? '',
      help: v.help,
      targets: v.nodes.slice(0, 5).map((n) => n.target.map(String).join(' ')),
    }));
}

/** How far the page itself scrolls sideways, in CSS pixels (0 when it fits the window). */
export function sidewaysOverflow(page: Page) {
  return page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
}

/**
 * The three checks every screen passes, with a full-page screenshot under test-artifacts/screenshots/<name>.png:
 * the page does not scroll sideways, nothing was said on the console since the last check, and axe-core finds no
 * serious or critical violation. Returns every problem found (empty when the screen is clean), so a walk can name
 * them all at once; `expectScreenClean` turns them into a failing assertion.
 */
export async function screenProblems(page: Page, console: ReturnType<typeof watchConsole>, name: string) {
  // Fonts and lazy modules settle before measuring, so the figures are the ones a person sees.
  await page.waitForLoadState('networkidle');
  await page.evaluate(() => document.fonts.ready.then(() => undefined));
  await saveScreenshot(page, name);
  const problems: string[] = [];
  const overflow = await sidewaysOverflow(page);
  if (overflow > 0) problems.push(`${name}: the page scrolls sideways by ${overflow} px`);
  for (const line of console.take()) problems.push(`${name}: console ${line}`);
  for (const f of await axeFindings(page)) {
    problems.push(`${name}: axe ${f.impact} ${f.id} (${f.help}) at ${f.targets.join(' | ')}`);
  }
  return problems;
}

/** The same checks as one assertion, for a test that adds its own screen. */
export async function expectScreenClean(page: Page, console: ReturnType<typeof watchConsole>, name: string) {
  const problems = await screenProblems(page, console, name);
  if (problems.length > 0) throw new Error(`Screen "${name}" is not clean:\n${problems.join('\n')}`);
}

/** Presses Tab, as a keyboard user does, until the given control has focus (fails after `most` presses). */
export async function tabUntilFocused(page: Page, control: Locator, most = 200) {
  for (let i = 0; i < most; i += 1) {
    await page.keyboard.press('Tab');
    if (await control.evaluate((el) => el === document.activeElement).catch(() => false)) return;
  }
  throw new Error(`Tab never reached ${control.toString()}`);
}
