import { formatDay } from '@shared/format/dates';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { useDocuments } from '../api/get-documents';
import { useShareDocument } from '../api/share-document';

/** A request's documents with short-lived download links; the office can share each with the homeowner. */
export function DocumentsList({ requestId, canShare }: { requestId: string; canShare: boolean }) {
  const { data, isPending, error } = useDocuments(requestId);
  const share = useShareDocument(requestId);
  if (isPending) return <Loading label="Loading documents…" />;
  if (error) return <ErrorNotice error={error} />;
  if (data.documents.length === 0) return <p className="text-sm text-stone-600">No documents yet.</p>;
  return (
    <ul className="divide-y divide-stone-100" aria-label="Documents">
      {data.documents.map((doc) => (
        <li key={doc.id} className="flex flex-wrap items-center justify-between gap-3 py-2">
          <div>
            <a className="font-semibold text-pine-700 underline" href={doc.url} target="_blank" rel="noreferrer">
              {doc.title}
            </a>
            <span className="ml-2 text-xs text-stone-600">
              PDF · {Math.max(1, Math.round(doc.sizeBytes / 1024))} KB · {formatDay(doc.createdAt)}
            </span>
          </div>
          {canShare && (
            <label className="flex items-center gap-2 text-sm">
              <input
                type="checkbox"
                checked={doc.sharedWithApplicant}
                disabled={share.isPending}
                onChange={(e) => share.mutate({ documentId: doc.id, sharedWithApplicant: e.target.checked })}
              />
              Share with the homeowner
            </label>
          )}
        </li>
      ))}
      {share.error && (
        <li>
          <ErrorNotice error={share.error} />
        </li>
      )}
    </ul>
  );
}
