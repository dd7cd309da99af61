import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/notice';
import { useDeleteDraft } from '../api/delete-draft';

/** Deletes a request not yet sent, after a yes that names it: there is no getting it back. */
export function DeleteDraftButton({ requestId, reference }: { requestId: string; reference: string }) {
  const [asking, setAsking] = useState(false);
  const remove = useDeleteDraft();
  if (!asking)
    return (
      <Button variant="quiet" onClick={() => setAsking(true)}>
        Delete draft {reference}
      </Button>
    );
  return (
    <div role="group" aria-label={`Delete draft ${reference}?`} className="space-y-2 text-sm">
      <p>Delete {reference} with its answers and photos? It was never sent, and it cannot be brought back.</p>
      <div className="flex flex-wrap gap-2">
        <Button variant="danger" disabled={remove.isPending} onClick={() => remove.mutate(requestId)}>
          {remove.isPending ? 'Deleting…' : 'Yes, delete it'}
        </Button>
        <Button variant="secondary" onClick={() => setAsking(false)}>
          Keep it
        </Button>
      </div>
      <ErrorNotice error={remove.error} />
    </div>
  );
}
