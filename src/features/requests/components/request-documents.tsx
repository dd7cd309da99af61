import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/notice';
import { getDocumentUrl } from '../api/get-document-url';
import type { RequestDocumentView } from '@shared/contracts/requests';

const size = (bytes: number) =>
  bytes > 1024 * 1024 ? `${(bytes / 1024 / 1024).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} kB`;

/** What the office has shared: the grade check report, the permit. */
export function RequestDocuments({ requestId, documents }: { requestId: string; documents: RequestDocumentView[] }) {
  const [error, setError] = useState<unknown>(null);
  if (documents.length === 0)
    return <p className="text-sm text-stone-600">The office has not shared any documents yet.</p>;
  const open = async (id: string) => {
    setError(null);
    try {
      const { url } = await getDocumentUrl(requestId, id);
      window.open(url, '_blank', 'noopener');
    } catch (e) {
      setError(e);
    }
  };
  return (
    <div className="space-y-2">
      <ul className="divide-y divide-stone-200">
        {documents.map((d) => (
          <li key={d.id} className="flex items-center justify-between gap-3 py-2">
            <span>
              <span className="font-semibold">{d.title}</span>{' '}
              <span className="text-xs text-stone-600">{size(d.sizeBytes)}</span>
            </span>
            <Button variant="secondary" onClick={() => void open(d.id)}>
              Open
            </Button>
          </li>
        ))}
      </ul>
      <ErrorNotice error={error} />
    </div>
  );
}
