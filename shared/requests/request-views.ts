import type { RequestStatus, Role } from '../workflow/statuses';
import type { ApplicationDraft } from './application-schema';

/**
 * What GET /api/requests/:id returns to every reader; the office's and the owner's views add their own fields.
 * Dates are ISO strings, as they arrive in JSON.
 */
export interface RequestViewBase {
  id: string;
  reference: string;
  status: RequestStatus;
  statusLabel: string;
  whatNext: string;
  version: number;
  application: ApplicationDraft;
  applicantName: string;
  siteAddress: string;
  roadName: string;
  visitAt: string | null;
  permitReference: string | null;
  permitDecidedOn: string | null;
  permitConditions: string | null;
  submittedAt: string | null;
  statusChangedAt: string;
}

/** One entry of GET /api/requests/:id/events; `internal` is only sent to the office. */
export interface TimelineEventView {
  id: number;
  kind: string;
  fromStatus: RequestStatus | null;
  toStatus: RequestStatus | null;
  note: string;
  createdAt: string;
  actorName: string | null;
  actorRole: Role | null;
  internal?: boolean;
}
