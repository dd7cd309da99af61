import { useState } from 'react';
import { crewPhotoKindLabels, type CrewPhotoView } from '@shared/contracts/crew-photos';
import { formatDay } from '@shared/format/dates';
import { UnshowablePhoto } from '@/components/ui/unshowable-photo';

type ShownPhoto = Omit<CrewPhotoView, 'takenBy'> & { url: string; takenBy?: string };

const position = (p: ShownPhoto) =>
  p.gpsLat !== null && p.gpsLng !== null ? `${p.gpsLat.toFixed(5)}, ${p.gpsLng.toFixed(5)}` : null;

function CrewPhotoTile({ photo, onRemove }: { photo: ShownPhoto; onRemove?: () => void }) {
  const [broken, setBroken] = useState(false);
  const where = position(photo);
  return (
    <li className="flex min-w-0 flex-col gap-1 rounded-md border border-stone-200 bg-white p-2">
      <a href={photo.url} target="_blank" rel="noreferrer" className="block overflow-hidden rounded bg-stone-100">
        {broken ? (
          <UnshowablePhoto contentType={photo.contentType} className="aspect-[4/3] w-full" />
        ) : (
          <img
            src={photo.url}
            alt={`${crewPhotoKindLabels[photo.kind]}${photo.caption ? `: ${photo.caption}` : ''}`}
            className="aspect-[4/3] w-full object-cover"
            onError={() => setBroken(true)}
          />
        )}
      </a>
      <p className="text-sm font-semibold text-pine-900">{crewPhotoKindLabels[photo.kind]}</p>
      {photo.caption && <p className="break-words text-sm text-stone-700">{photo.caption}</p>}
      <p className="text-xs text-stone-600">
        {formatDay(photo.createdAt)}
        {photo.takenBy ? ` · ${photo.takenBy}` : ''}
        {where ? ` · taken at ${where}` : ' · no position recorded'}
      </p>
      {onRemove && (
        <button type="button" onClick={onRemove} className="self-start text-sm text-clay underline">
          Remove this photo
        </button>
      )}
    </li>
  );
}

/** The crew's photos, grouped by what they show: the culvert before backfill first, then the finished entrance. */
export function CrewPhotoGrid({
  photos,
  emptyText = 'The crew has not added photos yet.',
  onRemove,
}: {
  photos: ShownPhoto[];
  emptyText?: string;
  onRemove?: (photoId: string) => void;
}) {
  if (photos.length === 0) return <p className="text-sm text-stone-600">{emptyText}</p>;
  const order = ['culvert_before_backfill', 'finished_entrance'];
  const sorted = [...photos].sort((a, b) => order.indexOf(a.kind) - order.indexOf(b.kind));
  return (
    <ul className="grid grid-cols-1 gap-3 sm:grid-cols-2 lg:grid-cols-3" aria-label="Crew photos">
      {sorted.map((photo) => (
        <CrewPhotoTile key={photo.id} photo={photo} onRemove={onRemove ? () => onRemove(photo.id) : undefined} />
      ))}
    </ul>
  );
}
