import { formatDay } from '@shared/format/dates';
import { Link } from 'react-router';
import { StatusBadge } from '@/components/ui/status-badge';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { useMyRequests } from '../api/get-my-requests';
import { DeleteDraftButton } from './delete-draft-button';

const when = (iso: string) => formatDay(iso);

/** The applicant's requests: where each stands, when it last moved, and what (if anything) is theirs to do. */
export function MyRequestsTable({ hrefFor }: { hrefFor: (id: string, status: string) => string }) {
  const { data, error, isPending } = useMyRequests();
  if (isPending) return <Loading />;
  if (error) return <ErrorNotice error={error} />;
  if (data.requests.length === 0)
    return <p className="text-stone-600">You have no requests yet. Start one to ask for a driveway entrance.</p>;
  return (
    <div>
      {/* On a phone each request is a card of its own (`stack-table`), so no column is cut off. */}
      <table className="stack-table w-full border-collapse text-left text-sm">
        <caption className="sr-only">Your driveway entrance requests</caption>
        <thead className="border-b-2 border-pine-200 text-xs uppercase tracking-wide text-stone-600">
          <tr>
            <th scope="col" className="py-2 pr-4">
              Request
            </th>
            <th scope="col" className="py-2 pr-4">
              Site
            </th>
            <th scope="col" className="py-2 pr-4">
              Status
            </th>
            <th scope="col" className="py-2 pr-4">
              Last change
            </th>
            <th scope="col" className="py-2">
              Your part
            </th>
          </tr>
        </thead>
        <tbody>
          {data.requests.map((r) => (
            <tr key={r.id} className="border-b border-stone-200">
              <td data-label="Request" className="py-3 pr-4 font-mono">
                <Link className="font-semibold text-pine-700 underline" to={hrefFor(r.id, r.status)}>
                  {r.reference}
                </Link>
              </td>
              <td data-label="Site" className="py-3 pr-4">
                {r.siteAddress || <span className="text-stone-600">Not filled in yet</span>}
                {r.roadName && <span className="block text-xs text-stone-600">on {r.roadName}</span>}
              </td>
              <td data-label="Status" className="py-3 pr-4">
                <StatusBadge status={r.status} />
              </td>
              <td data-label="Last change" className="py-3 pr-4">
                {when(r.statusChangedAt)}
              </td>
              <td
                data-label="Your part"
                className={`py-3 ${r.expected === 'Nothing for now' ? 'text-stone-600' : 'font-semibold text-amber-900'}`}
              >
                {r.expected}
                {r.status === 'draft' && (
                  <div className="mt-1 font-normal">
                    <DeleteDraftButton requestId={r.id} reference={r.reference} />
                  </div>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
