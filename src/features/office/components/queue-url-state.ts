import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router';
import { requestStatuses, type RequestStatus } from '@shared/workflow/statuses';
import { defaultQueueFilters } from '../api/get-queue';
import { queueSorts, type QueueFilters, type QueueSort } from '../api/types';

/**
 * The queue's whole view lives in the URL, so a link or a reload shows the same page. Paging keeps the trail of
 * cursors it came through ("pages"), which is what makes "Previous" work without offsets.
 */
export function readQueueUrl(params: URLSearchParams): { filters: QueueFilters; trail: string[] } {
  const status = (params.get('status') ?? '')
    .split(',')
    .filter((s): s is RequestStatus => (requestStatuses as readonly string[]).includes(s));
  const sort = params.get('sort');
  const trail = (params.get('pages') ?? '').split('.').filter(Boolean);
  return {
    filters: {
      ...defaultQueueFilters,
      status,
      jurisdiction: params.get('jurisdiction') ?? '',
      assignee: params.get('assignee') ?? '',
      waiting: params.get('waiting') === 'true',
      q: params.get('q') ?? '',
      sort: queueSorts.includes(sort as QueueSort) ? (sort as QueueSort) : 'waiting',
      dir: params.get('dir') === 'desc' ? 'desc' : 'asc',
      cursor: trail.at(-1) ?? '',
    },
    trail,
  };
}

export function writeQueueUrl(filters: QueueFilters, trail: string[]): URLSearchParams {
  const params = new URLSearchParams();
  if (filters.status.length) params.set('status', filters.status.join(','));
  if (filters.jurisdiction) params.set('jurisdiction', filters.jurisdiction);
  if (filters.assignee) params.set('assignee', filters.assignee);
  if (filters.waiting) params.set('waiting', 'true');
  if (filters.q) params.set('q', filters.q);
  if (filters.sort !== 'waiting') params.set('sort', filters.sort);
  if (filters.dir !== 'asc') params.set('dir', filters.dir);
  if (trail.length) params.set('pages', trail.join('.'));
  return params;
}

export function useQueueUrl() {
  const [params, setParams] = useSearchParams();
  const { filters, trail } = useMemo(() => readQueueUrl(params), [params]);
  /** Any change of filter or sort starts again from the first page. */
  const update = useCallback(
    (change: Partial<QueueFilters>) => {
      setParams(writeQueueUrl({ ...filters, ...change, cursor: '' }, []), { replace: 'q' in change });
    },
    [filters, setParams],
  );
  const nextPage = useCallback(
    (cursor: string) => setParams(writeQueueUrl(filters, [...trail, cursor])),
    [filters, trail, setParams],
  );
  const previousPage = useCallback(
    () => setParams(writeQueueUrl(filters, trail.slice(0, -1))),
    [filters, trail, setParams],
  );
  return { filters, pageNumber: trail.length + 1, update, nextPage, previousPage };
}
