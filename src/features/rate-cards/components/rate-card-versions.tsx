import { formatDay } from '@shared/format/dates';
import type { RateCardView } from '@shared/contracts/rate-cards';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/notice';
import { useCreateRateCard } from '../api/create-rate-card';

/** Every version, newest first: one is current, at most one is a draft. */
export function RateCardVersions({
  versions,
  selectedId,
  onSelect,
  canEdit,
}: {
  versions: RateCardView[];
  selectedId: string;
  onSelect: (id: string) => void;
  canEdit: boolean;
}) {
  const create = useCreateRateCard();
  const hasDraft = versions.some((v) => v.status === 'draft');
  return (
    <div className="space-y-3">
      <ul className="divide-y divide-stone-100" aria-label="Rate card versions">
        {versions.map((v) => (
          <li key={v.id}>
            <button
              type="button"
              onClick={() => onSelect(v.id)}
              aria-current={v.id === selectedId ? 'true' : undefined}
              className={`w-full rounded px-2 py-2 text-left text-sm ${v.id === selectedId ? 'bg-pine-50' : 'hover:bg-stone-50'}`}
            >
              <span className="font-semibold">Version {v.version}</span>{' '}
              <span className="text-stone-600">
                {v.status === 'draft' ? 'draft' : v.current ? 'current' : 'earlier'}
              </span>
              {v.publishedAt && <span className="text-stone-600"> · {formatDay(v.publishedAt)}</span>}
              {v.changeNote && <span className="block text-xs text-stone-600">{v.changeNote}</span>}
            </button>
          </li>
        ))}
      </ul>
      {canEdit && !hasDraft && (
        <Button
          variant="secondary"
          disabled={create.isPending}
          onClick={() => create.mutate(selectedId || undefined, { onSuccess: (r) => onSelect(r.rateCard.id) })}
        >
          {versions.length === 0 ? 'Start the first rate card' : 'Start a new version from this one'}
        </Button>
      )}
      <ErrorNotice error={create.error} />
    </div>
  );
}
