import { Link } from 'react-router';
import { formatDay } from '@shared/format/when';
import type { MyRequestRow } from '@shared/contracts/requests';
import { DeleteDraftButton } from './delete-draft-button';

/** The owner's requests not yet sent, offered before a new one is started: most people mean to carry on. */
export function OpenDrafts({ drafts, hrefFor }: { drafts: MyRequestRow[]; hrefFor: (id: string) => string }) {
  return (
    <ul className="divide-y divide-stone-200" aria-label="Requests not sent yet">
      {drafts.map((d) => (
        <li key={d.id} className="flex flex-wrap items-start justify-between gap-3 py-3">
          <div>
            <p className="font-semibold">
              <span className="font-mono">{d.reference}</span> ·{' '}
              {d.siteAddress || <span className="text-stone-600">no address yet</span>}
            </p>
            <p className="text-sm text-stone-600">Last saved {formatDay(d.updatedAt)}</p>
          </div>
          <div className="flex flex-wrap items-center gap-2">
            <Link
              to={hrefFor(d.id)}
              className="rounded-md bg-pine-700 px-4 py-2 text-sm font-semibold text-white hover:bg-pine-800"
            >
              Carry on with {d.reference}
            </Link>
            <DeleteDraftButton requestId={d.id} reference={d.reference} />
          </div>
        </li>
      ))}
    </ul>
  );
}
