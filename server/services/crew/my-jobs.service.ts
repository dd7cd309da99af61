import { and, desc, eq, gt, inArray, or } from 'drizzle-orm';
import type { MyJob } from '@shared/crew/crew-views';
import type { SessionUser } from '../../lib/session-user';
import type { DbOrTx } from '../../db/client';
import { asBuiltSets, jobs, requestEvents, requests } from '../../db/schema';
import { permitOf } from './board.service';
import { wantedFrom } from './job-facts';

const FINISHED_SHOWN_DAYS = 30;

/** The crew lead's own jobs, from taken to built, plus the ones closed in the last month. */
export async function listMyJobs(db: DbOrTx, crew: SessionUser, now = new Date()): Promise<MyJob[]> {
  const since = new Date(now.getTime() - FINISHED_SHOWN_DAYS * 86_400_000);
  const rows = await db
    .select({ request: requests, job: jobs })
    .from(requests)
    .leftJoin(jobs, eq(jobs.requestId, requests.id))
    .where(
      and(
        eq(requests.crewId, crew.id),
        or(
          inArray(requests.status, ['crew_assigned', 'under_construction', 'built']),
          and(eq(requests.status, 'closed'), gt(requests.statusChangedAt, since)),
        ),
      ),
    )
    .orderBy(desc(requests.statusChangedAt))
    .limit(200);
  const out: MyJob[] = [];
  for (const { request: r, job } of rows) {
    const [set] = await db
      .select({ passed: asBuiltSets.passed, createdAt: asBuiltSets.createdAt })
      .from(asBuiltSets)
      .where(eq(asBuiltSets.requestId, r.id))
      .orderBy(desc(asBuiltSets.createdAt))
      .limit(1);
    const [sentBack] =
      r.status === 'under_construction'
        ? await db
            .select({ note: requestEvents.note })
            .from(requestEvents)
            .where(
              and(
                eq(requestEvents.requestId, r.id),
                eq(requestEvents.fromStatus, 'built'),
                eq(requestEvents.toStatus, 'under_construction'),
              ),
            )
            .orderBy(desc(requestEvents.createdAt))
            .limit(1)
        : [];
    out.push({
      requestId: r.id,
      reference: r.reference,
      version: r.version,
      status: r.status,
      siteAddress: r.siteAddress,
      roadName: r.roadName,
      applicantName: r.applicantName,
      wanted: wantedFrom(r.application, r.submittedAt),
      permit: permitOf(r),
      acceptedAt: job?.acceptedAt?.toISOString() ?? null,
      scheduledFor: job?.scheduledFor ?? null,
      startedAt: job?.startedAt?.toISOString() ?? null,
      builtAt: job?.builtAt?.toISOString() ?? null,
      lastAsBuilt: set ? { passed: set.passed, createdAt: set.createdAt.toISOString() } : null,
      sentBackNote: sentBack?.note ?? null,
    });
  }
  return out;
}
