import type { RequestStatus, Role } from '../workflow/statuses';
import type { Moment } from './wire';

/** One entry of GET /api/requests/:id/events, oldest first; `internal` is only sent to the office. */
export interface EventView<When extends Moment = string> {
  id: number;
  kind: string;
  fromStatus: RequestStatus | null;
  toStatus: RequestStatus | null;
  note: string;
  createdAt: When;
  actorName: string | null;
  actorRole: Role | null;
  internal?: boolean;
  /** The office only: the document the event is about (a filed permit packet, the authority's letter). */
  documentId?: string | null;
}

export interface EventsAnswer<When extends Moment = string> {
  events: EventView<When>[];
}
