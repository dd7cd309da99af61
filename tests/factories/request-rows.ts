import type { DbOrTx } from '../../server/db/client';
import { jobs, requestEvents, requests } from '../../server/db/schema';
import { nextReference } from '../../server/services/requests/reference';
import type { SubmittedApplication } from '@shared/requests/application-schema';

export type RequestRow = typeof requests.$inferSelect;

const onTheBoardOrLater = new Set(['released', 'crew_assigned', 'under_construction', 'built', 'closed']);

/** A complete application, as the wizard would leave it; the place names are invented. */
export function completeApplication(overrides: Partial<SubmittedApplication> = {}): SubmittedApplication {
  return {
    site: {
      address: '118 Larkspur Hollow Lane, Fenwick Falls',
      parcelNumber: '07-114-22',
      roadName: 'Quarry Ridge Road',
      roadOwner: 'county',
      postedSpeedMph: 45,
      positionKind: 'landmark',
      landmark: 'the green mailbox',
      distanceFromLandmarkFt: 60,
      siteLat: null,
      siteLng: null,
    },
    entrance: {
      work: 'new',
      use: 'home',
      vehicles: ['cars'],
      drivewayLengthFt: 140,
      riseToHouseFt: 9,
      existingDrainage: 'ditch',
      timing: 'flexible',
      notes: '',
    },
    ...overrides,
  };
}

/** A request row in any status, written straight to the table (the transitions under test come afterwards). */
export async function createRequestRow(
  db: DbOrTx,
  overrides: Partial<typeof requests.$inferInsert> & { applicantId: string },
): Promise<RequestRow> {
  const application = completeApplication();
  const [row] = await db
    .insert(requests)
    .values({
      reference: await nextReference(db),
      status: 'submitted',
      application,
      applicantName: 'Ellen Marsh',
      siteAddress: application.site.address,
      roadName: application.site.roadName,
      submittedAt: new Date(),
      ...overrides,
    })
    .returning();
  await db.insert(requestEvents).values({
    requestId: row.id,
    actorId: row.applicantId,
    kind: 'transition',
    fromStatus: 'draft',
    toStatus: row.status,
    note: '',
  });
  // Released requests have the crew job row the release step writes, as real data does.
  if (onTheBoardOrLater.has(row.status)) {
    await db.insert(jobs).values({ requestId: row.id, crewId: row.crewId, acceptedAt: row.crewId ? new Date() : null });
  }
  return row;
}
