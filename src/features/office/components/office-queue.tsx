import { Button } from '@/components/ui/button';
import { ErrorNotice, Loading, Notice } from '@/components/ui/notice';
import { useQueue } from '../api/get-queue';
import { QueueCards } from './queue-cards';
import { QueueFilterBar } from './queue-filters';
import { QueueTable } from './queue-table';
import { useQueueUrl } from './queue-url-state';

/** The office's working list: filters, the table and paging, all held in the URL. */
export function OfficeQueue({ meId }: { meId: string }) {
  const { filters, pageNumber, update, nextPage, previousPage } = useQueueUrl();
  const queue = useQueue(filters);
  const page = queue.data;
  return (
    <div className="space-y-4">
      <QueueFilterBar filters={filters} onChange={update} />
      {queue.error && <ErrorNotice error={queue.error} />}
      {queue.isPending && <Loading label="Loading the queue…" />}
      {page && (
        <>
          <p className="text-sm text-stone-600" aria-live="polite">
            {page.total === 0
              ? 'No requests match.'
              : page.total === null
                ? `Page ${pageNumber}.`
                : `${page.totalIsCapped ? `More than ${page.total}` : page.total} matching, page ${pageNumber}.`}
            {queue.isFetching && ' Updating…'}
          </p>
          {page.requests.length > 0 ? (
            <>
              <div className="hidden md:block">
                <QueueTable
                  rows={page.requests}
                  filters={filters}
                  meId={meId}
                  onSort={(sort, dir) => update({ sort, dir })}
                />
              </div>
              <div className="md:hidden">
                <QueueCards rows={page.requests} meId={meId} />
              </div>
            </>
          ) : (
            <Notice title="Nothing here">Try another status or clear the search.</Notice>
          )}
          <nav aria-label="Queue pages" className="flex items-center gap-3">
            <Button variant="secondary" disabled={pageNumber === 1} onClick={previousPage}>
              Previous page
            </Button>
            <Button
              variant="secondary"
              disabled={!page.nextCursor}
              onClick={() => page.nextCursor && nextPage(page.nextCursor)}
            >
              Next page
            </Button>
          </nav>
        </>
      )}
    </div>
  );
}
