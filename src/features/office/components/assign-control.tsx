import { useQueueOptions } from '../api/get-queue-options';
import { useAssignRequest } from '../api/assign-request';

interface AssignControlProps {
  requestId: string;
  assigneeId: string | null;
  meId: string;
  label: string;
}

/** Who in the office has this request: a quick "me" and a list of colleagues. */
export function AssignControl({ requestId, assigneeId, meId, label }: AssignControlProps) {
  const people = useQueueOptions().data?.people ?? [];
  const assign = useAssignRequest();
  return (
    <div className="flex items-center gap-2">
      <select
        aria-label={label}
        className="max-w-40 rounded border border-stone-300 bg-white px-2 py-1 text-sm"
        value={assigneeId ?? ''}
        disabled={assign.isPending}
        onChange={(e) => assign.mutate({ id: requestId, assigneeId: e.target.value || null })}
      >
        <option value="">Nobody yet</option>
        {people.map((p) => (
          <option key={p.id} value={p.id}>
            {p.id === meId ? `${p.name} (me)` : p.name}
          </option>
        ))}
      </select>
      {assigneeId !== meId && (
        <button
          type="button"
          className="whitespace-nowrap text-sm font-semibold text-pine-700 hover:underline disabled:text-stone-400"
          disabled={assign.isPending}
          onClick={() => assign.mutate({ id: requestId, assigneeId: meId })}
        >
          Take it
        </button>
      )}
      {assign.error && (
        <span role="alert" className="text-xs text-clay">
          {assign.error.message}
        </span>
      )}
    </div>
  );
}
