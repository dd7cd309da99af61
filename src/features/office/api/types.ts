import type { RequestStatus } from '@shared/workflow/statuses';
import type { QueueSort } from '@shared/contracts/queue';

export {
  queueSorts,
  type OfficePerson,
  type QueueOptions,
  type QueuePage,
  type QueueRow,
  type QueueSort,
} from '@shared/contracts/queue';

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
