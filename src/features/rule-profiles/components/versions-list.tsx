import { formatDay } from '@shared/format/dates';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/notice';
import { useCreateDraft } from '../api/create-draft';
import type { JurisdictionDetail } from '../api/get-jurisdiction';

interface VersionsListProps {
  jurisdiction: JurisdictionDetail;
  selectedId: string;
  onSelect: (id: string) => void;
  canEdit: boolean;
}

/** Every version, newest first; one is current, at most one is a draft. */
export function VersionsList({ jurisdiction, selectedId, onSelect, canEdit }: VersionsListProps) {
  const createDraft = useCreateDraft(jurisdiction.id);
  const hasDraft = jurisdiction.versions.some((v) => v.status === 'draft');
  return (
    <div className="space-y-3">
      <ul className="divide-y divide-stone-100" aria-label="Versions">
        {jurisdiction.versions.map((v) => (
          <li key={v.id}>
            <button
              type="button"
              onClick={() => onSelect(v.id)}
              aria-current={v.id === selectedId ? 'true' : undefined}
              className={`w-full rounded px-2 py-2 text-left text-sm ${v.id === selectedId ? 'bg-pine-50' : 'hover:bg-stone-50'}`}
            >
              <span className="font-semibold">Version {v.version}</span>{' '}
              <span className="text-stone-600">
                {v.status === 'draft' ? 'draft' : v.id === jurisdiction.currentVersionId ? 'current' : 'published'}
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
          disabled={createDraft.isPending}
          onClick={() =>
            createDraft.mutate(
              { jurisdictionId: jurisdiction.id, fromVersionId: selectedId || undefined },
              { onSuccess: (r) => onSelect(r.version.id) },
            )
          }
        >
          Start a new version from this one
        </Button>
      )}
      <ErrorNotice error={createDraft.error} />
    </div>
  );
}
