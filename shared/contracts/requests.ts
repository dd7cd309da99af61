import { z } from 'zod';
import { entranceStepShape, siteStepShape, type ApplicationDraft } from '../requests/application-schema';
import type { TransitionNeed } from '../workflow/transitions';
import type { RequestStatus } from '../workflow/statuses';
import type { Moment } from './wire';

/** The owner may change the answers while the request is a draft or the office has asked for more. */
export const answerEditableStatuses: readonly RequestStatus[] = ['draft', 'needs_details'];

/** PATCH /api/requests/:id/draft: one or both wizard steps, named by the version the owner last read. */
export const saveDraftInputSchema = z.strictObject({
  expectedVersion: z.number({ error: 'Must be the version number you last read.' }).int().min(1),
  wizardStep: z
    .number({ error: 'Must be a step number.' })
    .int()
    .min(0, 'Steps are 0 to 3.')
    .max(3, 'Steps are 0 to 3.')
    .optional(),
  site: siteStepShape.partial().optional(),
  entrance: entranceStepShape.partial().optional(),
});
export type SaveDraftInput = z.input<typeof saveDraftInputSchema>;

/**
 * PUT /api/requests/:id/site-position: the office sets where the entrance is (found on the visit or on a map), so
 * the crews' board can give the distance. Each error names the box by its label.
 */
export const sitePositionLabels = { lat: 'Latitude', lng: 'Longitude' } as const;
const coordinate = (label: string, limit: number) =>
  z
    .number({ error: `${label}: enter a number in decimal degrees, e.g. ${limit === 90 ? '44.26157' : '-72.57538'}.` })
    .min(-limit, `${label} is between -${limit} and ${limit}.`)
    .max(limit, `${label} is between -${limit} and ${limit}.`);
export const sitePositionInputSchema = z.strictObject({
  lat: coordinate(sitePositionLabels.lat, 90),
  lng: coordinate(sitePositionLabels.lng, 180),
});
export type SitePositionInput = z.infer<typeof sitePositionInputSchema>;

/** An action its reader may take now, from shared/workflow's table. */
export interface RequestActionView {
  action: string;
  label: string;
  needs: readonly TransitionNeed[];
  to: RequestStatus;
}

/**
 * GET /api/requests/:id as every reader gets it. Everything the applicant gave goes to everyone who may see the
 * request; the office's own bookkeeping only in `OfficeRequestView`.
 */
export interface RequestView<When extends Moment = string> {
  id: string;
  reference: string;
  status: RequestStatus;
  statusLabel: string;
  whatNext: string;
  version: number;
  wizardStep: number;
  application: ApplicationDraft;
  applicantName: string;
  siteAddress: string;
  roadName: string;
  siteLat: number | null;
  siteLng: number | null;
  visitAt: When | null;
  /** The day the crew plans to build, once they have set one (filled by GET /api/requests/:id). */
  workDay?: string | null;
  permitReference: string | null;
  permitDecidedOn: string | null;
  permitConditions: string | null;
  permitExpiresOn: string | null;
  submittedAt: When | null;
  statusChangedAt: When;
  createdAt: When;
  updatedAt: When;
  actions: RequestActionView[];
}

export interface OfficeRequestView<When extends Moment = string> extends RequestView<When> {
  applicantId: string;
  assigneeId: string | null;
  crewId: string | null;
  jurisdictionId: string | null;
  /** The crew lead who has the job, once one has taken it (filled by GET /api/requests/:id). */
  crewLeadName?: string | null;
}

/** A document on the request (grade-check reports and the like), as listed beside it. */
export interface RequestDocumentView {
  id: string;
  kind: string;
  title: string;
  contentType: string;
  sizeBytes: number;
  createdAt: string;
}

export interface RequestAnswer<View extends RequestView = RequestView> {
  request: View;
  documents: RequestDocumentView[];
}

/** One row of GET /api/requests/mine. */
export interface MyRequestRow<When extends Moment = string> {
  id: string;
  reference: string;
  status: RequestStatus;
  siteAddress: string;
  roadName: string;
  statusChangedAt: When;
  updatedAt: When;
  expected: string;
}
