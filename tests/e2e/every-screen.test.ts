import { eq } from 'drizzle-orm';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDb } from '../../server/db/client';
import { jurisdictions, requests } from '../../server/db/schema';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { appUrl, launchBrowser, signInAs } from '../setup/browser';
import { newSizedContext, screenProblems, watchConsole, type ScreenSize } from '../setup/page-checks';

/**
 * Every role walks its main screens at a laptop's and a phone's size. On each: no sideways scroll, nothing on the
 * console, no serious or critical axe-core violation, and a screenshot under test-artifacts/screenshots/walk-*.
 * A new screen joins the walk with one line in `walks` below.
 */
let session: Awaited<ReturnType<typeof launchBrowser>>;
let db: ReturnType<typeof createDb>;
const ids: Record<string, string> = {};

const person = (email: string) => demoPeople.find((p) => p.email === email)!;
const requestAt = async (address: string) =>
  (await db.db.select({ id: requests.id }).from(requests).where(eq(requests.siteAddress, address)))[0].id;

beforeAll(async () => {
  session = await launchBrowser();
  db = createDb(inject('stack').adminDatabaseUrl.replace(/\/postgres$/, '/gradepass_e2e'), { max: 2 });
  ids.ownerSubmitted = await requestAt('77 Pennywhistle Lane, Elderbrook');
  ids.underWay = await requestAt('3187 Stonecrop Pike, Marrow Crossing');
  ids.built = await requestAt('400 Larkspur Ridge Road, Elderbrook');
  ids.quoteAccepted = await requestAt('904 Old Mill Road, Marrow Crossing');
  ids.county = (
    await db.db.select({ id: jurisdictions.id }).from(jurisdictions).where(eq(jurisdictions.slug, 'marrow-county'))
  )[0].id;
});
afterAll(async () => {
  await db?.pool.end();
  await session?.close();
});

interface Screen {
  name: string;
  path: () => string;
}

/** Each role's main screens, in the order a person meets them. */
const walks: { role: string; email: string | null; screens: Screen[] }[] = [
  {
    role: 'signed-out',
    email: null,
    screens: [
      { name: 'landing', path: () => '/' },
      { name: 'sign-in', path: () => '/sign-in' },
      { name: 'not-found', path: () => '/no-such-page' },
    ],
  },
  {
    role: 'homeowner',
    email: 'sam.whitcombe@example.test',
    screens: [
      { name: 'my-requests', path: () => '/my/requests' },
      { name: 'new-request', path: () => '/my/requests/new' },
      { name: 'request', path: () => `/my/requests/${ids.ownerSubmitted}` },
      { name: 'request-under-way', path: () => `/my/requests/${ids.underWay}` },
      { name: 'request-quote-accepted', path: () => `/my/requests/${ids.quoteAccepted}` },
    ],
  },
  {
    role: 'office',
    email: 'marcus.bell@gradepass.test',
    screens: [
      { name: 'queue', path: () => '/office/queue' },
      { name: 'request', path: () => `/office/requests/${ids.underWay}` },
      { name: 'grade-check', path: () => `/office/requests/${ids.underWay}/grade-check` },
      { name: 'request-built', path: () => `/office/requests/${ids.built}` },
      { name: 'rule-profiles', path: () => '/office/rule-profiles' },
      { name: 'rule-profile', path: () => `/office/rule-profiles/${ids.county}` },
      { name: 'emails', path: () => '/office/emails' },
      { name: 'calendar', path: () => '/office/calendar' },
      { name: 'payments', path: () => '/office/payments' },
      { name: 'request-quoted', path: () => `/office/requests/${ids.quoteAccepted}` },
      { name: 'field-sheet', path: () => `/crew/jobs/${ids.underWay}/field-sheet` },
    ],
  },
  {
    role: 'crew-lead',
    email: 'jo.haverford@gradepass.test',
    screens: [
      { name: 'board', path: () => '/crew/board' },
      { name: 'my-jobs', path: () => '/crew/my-jobs' },
      { name: 'field-sheet', path: () => `/crew/jobs/${ids.underWay}/field-sheet` },
      { name: 'as-built', path: () => `/crew/jobs/${ids.underWay}/as-built` },
    ],
  },
  {
    role: 'admin',
    email: 'dana.okafor@gradepass.test',
    screens: [
      { name: 'queue', path: () => '/office/queue' },
      { name: 'users', path: () => '/office/users' },
      { name: 'rule-profile', path: () => `/office/rule-profiles/${ids.county}` },
      { name: 'board', path: () => '/crew/board' },
      { name: 'emails', path: () => '/office/emails' },
      { name: 'rate-card', path: () => '/office/rate-card' },
      { name: 'changes', path: () => '/office/changes' },
      { name: 'crew-yard', path: () => '/office/crew-yard' },
      { name: 'payments', path: () => '/office/payments' },
    ],
  },
];

async function visit(page: Page, path: string) {
  await page.goto(appUrl(path));
  await page.getByRole('heading').first().waitFor();
  // A screen still loading shows its own words: wait until nothing says it is loading.
  await page
    .getByRole('status')
    .filter({ hasText: /^Loading/ })
    .first()
    .waitFor({ state: 'detached' });
}

describe('every role walks its main screens at laptop and phone size', () => {
  for (const walk of walks) {
    for (const size of ['laptop', 'phone'] as ScreenSize[]) {
      it(`${walk.role} at ${size} size: no sideways scroll, no console noise, no serious axe finding`, async () => {
        const context = await newSizedContext(session.browser, size);
        const page = await context.newPage();
        const heard = watchConsole(page);
        if (walk.email) {
          expect(person(walk.email)).toBeDefined();
          await signInAs(page, walk.email);
        }
        const problems: string[] = [];
        for (const screen of walk.screens) {
          await visit(page, screen.path());
          problems.push(...(await screenProblems(page, heard, `walk-${walk.role}-${screen.name}-${size}`)));
        }
        await context.close();
        expect(problems).toEqual([]);
      });
    }
  }
});
