import type { ApplicationDraft } from '@shared/requests/application-schema';
import type { TransitionNeed } from '@shared/workflow/transitions';
import type { RequestStatus, Role } from '@shared/workflow/statuses';

/** A request as GET /api/requests/:id returns it to its reader. */
export interface RequestDetail {
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
  visitAt: string | null;
  permitReference: string | null;
  permitDecidedOn: string | null;
  permitConditions: string | null;
  submittedAt: string | null;
  statusChangedAt: string;
  updatedAt: string;
  actions: { action: string; label: string; needs: TransitionNeed[]; to: RequestStatus }[];
}

export interface RequestDocument { id: string; kind: string; title: string; contentType: string; sizeBytes: number; createdAt: string }

export interface RequestEvent {
  id: number;
  kind: string;
  fromStatus: RequestStatus | null;
  toStatus: RequestStatus | null;
  note: string;
  createdAt: string;
  actorName: string | null;
  actorRole: Role | null;
}

export interface RequestMessage { id: string; body: string; createdAt: string; authorName: string; authorRole: Role; mine: boolean }
