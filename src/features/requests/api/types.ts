import type { RequestViewBase, TimelineEventView } from '@shared/requests/request-views';
import type { TransitionNeed } from '@shared/workflow/transitions';
import type { RequestStatus, Role } from '@shared/workflow/statuses';

/** A request as GET /api/requests/:id returns it to its owner. */
export interface RequestDetail extends RequestViewBase {
  wizardStep: number;
  updatedAt: string;
  actions: { action: string; label: string; needs: TransitionNeed[]; to: RequestStatus }[];
}

export interface RequestDocument { id: string; kind: string; title: string; contentType: string; sizeBytes: number; createdAt: string }

export type RequestEvent = TimelineEventView;

export interface RequestMessage { id: string; body: string; createdAt: string; authorName: string; authorRole: Role; mine: boolean }
