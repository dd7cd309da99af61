import type { RequestStatus, Role } from '@shared/workflow/statuses';

export const queueSorts = ['waiting', 'reference', 'applicant', 'road', 'created'] as const;
export type QueueSort = (typeof queueSorts)[number];

/** The queue's view as the URL holds it; every field maps to one query parameter of GET /api/queue. */
export interface QueueFilters {
  status: RequestStatus[];
  jurisdiction: string;
  assignee: string;
  waiting: boolean;
  q: string;
  sort: QueueSort;
  dir: 'asc' | 'desc';
  cursor: string;
}

export interface QueueRow {
  id: string;
  reference: string;
  status: RequestStatus;
  statusLabel: string;
  applicantName: string;
  roadName: string;
  statusChangedAt: string;
  waitingOnUs: boolean;
  nextAction: string;
  jurisdiction: { id: string; name: string } | null;
  assignee: { id: string; name: string } | null;
}

/** `total` is counted on the first page only (later pages leave it null) and only up to a cap (`totalIsCapped`). */
export interface QueuePage {
  requests: QueueRow[];
  nextCursor: string | null;
  total: number | null;
  totalIsCapped: boolean;
}

export interface OfficePerson {
  id: string;
  name: string;
  role: Role;
}
export interface QueueOptions {
  jurisdictions: { id: string; name: string }[];
  people: OfficePerson[];
}
