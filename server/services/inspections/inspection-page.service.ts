import { and, desc, eq, inArray } from 'drizzle-orm';
import type { AsBuiltReadingResult, AsBuiltStatus } from '@shared/engine';
import type { InspectionView, InspectorPageView } from '@shared/contracts/inspections';
import { statusText } from '@shared/workflow/statuses';
import type { AppContext } from '../../config/context';
import type { DbOrTx } from '../../db/client';
import { documents, inspections, inspectorLinks, jobs, jurisdictions, requestEvents, requests } from '../../db/schema';
import { notFound } from '../../lib/errors';
import { latestSet } from '../crew/as-built.service';
import { loadJobCheck, ruleProfileLabel } from '../crew/saved-check';
import { listCrewPhotos } from '../photos/crew-photos.service';
import { viewSeconds, viewUrl } from '../photos/photos.service';
import { downloadUrl } from '../reports/report-storage';
import type { InspectorLinkRow } from './inspector-links.service';

type PageContext = Pick<AppContext, 'db' | 's3' | 'env'>;

/** The documents an inspector is given: the stored permit packet when there is one, and the grade check report. */
const inspectorDocumentKinds = ['permit-packet', 'grade-check-report'];

/** Cautions for anyone reading the page before a shovel goes in (the inspector may ask for rework). */
const pageCautions = [
  'Any rework: have buried utilities located and marked before digging, follow trench-safety rules, and set up traffic control in the right-of-way.',
  'Gradepass supports, and never replaces, the road authority’s review, local codes and licensed engineering.',
];

export async function listInspections(db: DbOrTx, requestId: string): Promise<InspectionView<Date>[]> {
  const rows = await db
    .select()
    .from(inspections)
    .where(eq(inspections.requestId, requestId))
    .orderBy(desc(inspections.createdAt));
  return rows.map((r) => ({
    id: r.id,
    passed: r.passed,
    inspectorName: r.inspectorName,
    items: Array.isArray(r.items) ? (r.items as unknown[]).filter((i): i is string => typeof i === 'string') : [],
    note: r.note,
    createdAt: r.createdAt,
  }));
}

/** The crew's words for the inspector: the note with the last readings, and the note given when marking it built. */
async function crewNoteOf(db: DbOrTx, requestId: string, setNote: string) {
  const [built] = await db
    .select({ note: requestEvents.note })
    .from(requestEvents)
    .where(
      and(
        eq(requestEvents.requestId, requestId),
        eq(requestEvents.toStatus, 'built'),
        eq(requestEvents.internal, false),
      ),
    )
    .orderBy(desc(requestEvents.createdAt))
    .limit(1);
  return [setNote.trim(), built?.note.trim() ?? ''].filter((n, i, all) => n && all.indexOf(n) === i).join('\n\n');
}

/**
 * What the inspector's page shows for the one request its link opens: the permit, the documents, the grade check,
 * the last as-built readings with their verdicts, the crew's photos and note, and earlier inspections. Nothing of
 * the office's internal notes or events, and no person's contact details: the office's address is the one contact.
 */
export async function inspectorPage(
  ctx: PageContext,
  link: InspectorLinkRow,
  now = new Date(),
): Promise<InspectorPageView<Date>> {
  const [row] = await ctx.db
    .select({ request: requests, jurisdiction: jurisdictions, builtAt: jobs.builtAt })
    .from(requests)
    .leftJoin(jurisdictions, eq(jurisdictions.id, requests.jurisdictionId))
    .leftJoin(jobs, eq(jobs.requestId, requests.id))
    .where(eq(requests.id, link.requestId));
  if (!row) throw notFound('Inspection page');
  const { request } = row;
  const [check, set, photoRows, docRows, pastInspections] = await Promise.all([
    loadJobCheck(ctx.db, request.id),
    latestSet(ctx.db, request.id),
    listCrewPhotos(ctx.db, request.id),
    ctx.db
      .select()
      .from(documents)
      .where(and(eq(documents.requestId, request.id), inArray(documents.kind, inspectorDocumentKinds)))
      .orderBy(desc(documents.createdAt)),
    listInspections(ctx.db, request.id),
  ]);
  // Only the latest of each kind: the packet and the report the permit rests on.
  const latestDocs = inspectorDocumentKinds.flatMap((kind) => docRows.filter((d) => d.kind === kind).slice(0, 1));
  const stored = set?.results as { readings?: AsBuiltReadingResult[]; status?: AsBuiltStatus } | undefined;
  const canRecord = request.status === 'built' && !link.outcomeAt;
  await ctx.db.update(inspectorLinks).set({ lastOpenedAt: now }).where(eq(inspectorLinks.id, link.id));
  return {
    request: {
      id: request.id,
      reference: request.reference,
      siteAddress: request.siteAddress,
      roadName: request.roadName,
      status: request.status,
      statusLabel: statusText[request.status].label,
      builtAt: row.builtAt,
    },
    officeEmail: ctx.env.OFFICE_EMAIL,
    authority: row.jurisdiction ? { name: row.jurisdiction.name, authority: row.jurisdiction.authority } : null,
    permit: {
      reference: request.permitReference,
      decidedOn: request.permitDecidedOn,
      conditions: request.permitConditions,
      expiresOn: request.permitExpiresOn,
    },
    documents: await Promise.all(
      latestDocs.map(async (d) => ({ title: d.title, kind: d.kind, url: await downloadUrl(ctx, d) })),
    ),
    gradeCheck: check
      ? {
          number: check.number,
          summary: check.summary,
          passed: check.passed,
          ruleProfileLabel: ruleProfileLabel(check.ruleProfile),
        }
      : null,
    asBuilt: set
      ? {
          status: stored?.status ?? (set.passed ? 'pass' : 'fail'),
          passed: set.passed,
          readings: Array.isArray(stored) ? stored : (stored?.readings ?? []),
          takenAt: set.createdAt,
        }
      : null,
    crewNote: await crewNoteOf(ctx.db, request.id, set?.note ?? ''),
    crewPhotos: await Promise.all(
      photoRows.map(async (p) => ({
        id: p.id,
        kind: p.kind,
        fileName: p.fileName,
        contentType: p.contentType,
        sizeBytes: p.sizeBytes,
        caption: p.caption,
        gpsLat: p.gpsLat,
        gpsLng: p.gpsLng,
        createdAt: p.createdAt,
        storedAt: p.storedAt,
        url: await viewUrl(ctx, p),
        urlExpiresInSeconds: viewSeconds,
      })),
    ),
    inspections: pastInspections,
    link: {
      inspectorName: link.inspectorName,
      expiresAt: link.expiresAt,
      canRecord,
      whyNot: canRecord
        ? null
        : link.outcomeAt
          ? 'An outcome was recorded through this link. Thank you.'
          : `The job is "${statusText[request.status].label}", so no outcome can be recorded now.`,
    },
    cautions: pageCautions,
  };
}
