import { and, eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { requestStatuses } from '@shared/workflow/statuses';
import {
  asBuiltSets,
  documents,
  gradeChecks,
  jobs,
  quotes,
  rateCardVersions,
  requestEvents,
  requests,
  ruleProfileVersions,
} from '../../server/db/schema';
import { getAcceptedQuote } from '../../server/services/quotes/accepted-quote';
import { seedDemoQuotePdfs } from '../../server/dev/seed/demo-quotes';
import { seedDemo } from '../../server/dev/seed';
import { runGradeCheck } from '../../server/services/grade-checks/run-grade-check';
import { ruleProfileSchema } from '@shared/engine';
import { createTestApp, signIn, type TestApp } from '../setup/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
  await seedDemo(t.ctx.db);
});
afterAll(() => t.close());

describe('the demo scenario', () => {
  it('has requests in every status, and a second seed adds nothing', async () => {
    const count = async () => (await t.ctx.db.select({ n: sql<number>`count(*)::int` }).from(requests))[0].n;
    const before = await count();
    await seedDemo(t.ctx.db);
    expect(await count()).toBe(before);
    const statuses = new Set((await t.ctx.db.select({ s: requests.status }).from(requests)).map((r) => r.s));
    expect([...requestStatuses].filter((s) => s !== 'permit_refused' && !statuses.has(s))).toEqual([]);
  });

  it('records every status step as an event whose version matches', async () => {
    const rows = await t.ctx.db
      .select({ id: requests.id, version: requests.version, status: requests.status })
      .from(requests);
    for (const row of rows) {
      // Status changes only: the inspector's link and the inspection are history entries of other kinds.
      const events = await t.ctx.db
        .select()
        .from(requestEvents)
        .where(and(eq(requestEvents.requestId, row.id), eq(requestEvents.kind, 'transition')));
      expect(events.length).toBe(row.version - 1);
      if (events.length) expect(events.sort((a, b) => +a.createdAt - +b.createdAt).at(-1)!.toStatus).toBe(row.status);
    }
  });

  it('stores grade checks that the server reproduces from their inputs and profile version', async () => {
    const checks = await t.ctx.db
      .select({ check: gradeChecks, version: ruleProfileVersions })
      .from(gradeChecks)
      .innerJoin(ruleProfileVersions, eq(ruleProfileVersions.id, gradeChecks.ruleProfileVersionId));
    expect(checks.length).toBeGreaterThanOrEqual(7);
    for (const { check, version } of checks) {
      expect(check.attachedAt).not.toBeNull();
      const rules = ruleProfileSchema.parse(version.profile);
      const stamped = {
        ...rules,
        id: version.id,
        version: version.version,
        jurisdictionName: (check.results as { report: { jurisdictionName: string } }).report.jurisdictionName,
      };
      const again = await runGradeCheck(check.inputs as Parameters<typeof runGradeCheck>[0], stamped);
      expect(JSON.parse(JSON.stringify(again))).toEqual(check.results);
    }
  });

  it('gives built and closed jobs a crew, a build date and a passing as-built set', async () => {
    const done = await t.ctx.db
      .select({ r: requests, j: jobs })
      .from(requests)
      .innerJoin(jobs, eq(jobs.requestId, requests.id))
      .where(sql`${requests.status} in ('built', 'closed')`);
    expect(done.length).toBe(2);
    for (const { r, j } of done) {
      expect(j.crewId).toBe(r.crewId);
      expect(j.builtAt).not.toBeNull();
      const sets = await t.ctx.db.select().from(asBuiltSets).where(eq(asBuiltSets.requestId, r.id));
      expect(sets.map((s) => s.passed)).toEqual([true]);
    }
  });

  it('has a published rate card, a sent quote waiting for its owner and an accepted one, each added once', async () => {
    await seedDemo(t.ctx.db);
    const cards = await t.ctx.db.select().from(rateCardVersions);
    expect(cards.map((c) => [c.version, c.status])).toEqual([[1, 'published']]);
    const rows = await t.ctx.db
      .select({ q: quotes, address: requests.siteAddress })
      .from(quotes)
      .innerJoin(requests, eq(requests.id, quotes.requestId));
    expect(rows.map((r) => [r.address, r.q.status]).sort()).toEqual([
      ['2 Quillfeather Road, Elderbrook', 'sent'],
      ['904 Old Mill Road, Marrow Crossing', 'accepted'],
    ]);
    const accepted = rows.find((r) => r.q.status === 'accepted')!.q;
    const forPayment = await getAcceptedQuote(t.ctx.db, accepted.requestId);
    expect(forPayment).toMatchObject({ totalCents: accepted.totalCents, depositCents: accepted.depositCents });
    expect(forPayment!.balanceCents).toBe(accepted.totalCents - accepted.depositCents);
    for (const { q } of rows) {
      expect(q.totalCents).toBeGreaterThan(0);
      expect(q.totalCents).toBe(q.subtotalCents + q.taxCents);
    }
    // Once storage runs, each sent quote gets its PDF, shared with its owner, once.
    expect(await seedDemoQuotePdfs(t.ctx)).toBe(2);
    expect(await seedDemoQuotePdfs(t.ctx)).toBe(0);
    const docs = await t.ctx.db.select().from(documents).where(eq(documents.kind, 'quote'));
    expect(docs).toHaveLength(2);
    expect(docs.every((d) => d.sharedWithApplicant)).toBe(true);
    const withPdf = await t.ctx.db.select().from(quotes);
    expect(withPdf.map((q) => q.documentId).sort()).toEqual(docs.map((d) => d.id).sort());
  });

  it('shows each applicant only their own demo requests', async () => {
    const agent = await signIn(t.app, 'ellen.marsh@example.test');
    const mine = await agent.get('/api/requests/mine').expect(200);
    const list = (mine.body.requests ?? mine.body) as { siteAddress?: string; address?: string }[];
    expect(list.length).toBe(4);
  });
});
