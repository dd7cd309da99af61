import { useState } from 'react';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { usePhotos } from '../api/get-photos';
import { PhotoCard } from './photo-card';
import { PhotoViewer } from './photo-viewer';

interface PhotoGalleryProps {
  requestId: string;
  /** The owner, while the request still takes photos: captions can change and photos come out. */
  editable?: boolean;
  emptyText?: string;
}

/**
 * The request's stored photos as a grid, each opening a large viewer, shown through short-lived links the server
 * signs for people allowed to see them.
 */
export function PhotoGallery({ requestId, editable = false, emptyText = 'No photos yet.' }: PhotoGalleryProps) {
  const { data, error, isPending } = usePhotos(requestId);
  const [index, setIndex] = useState<number | null>(null);
  if (isPending) return <Loading label="Loading photos…" />;
  if (error) return <ErrorNotice error={error} />;
  if (data.photos.length === 0) return <p className="text-sm text-stone-600">{emptyText}</p>;
  return (
    <div>
      <p className="mb-2 text-sm text-stone-600">
        {data.photos.length === 1 ? '1 photo' : `${data.photos.length} photos`}
      </p>
      <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3" aria-label="Site photos">
        {data.photos.map((photo, i) => (
          <PhotoCard
            key={photo.id}
            photo={photo}
            requestId={requestId}
            editable={editable}
            onOpen={() => setIndex(i)}
          />
        ))}
      </ul>
      <PhotoViewer requestId={requestId} photos={data.photos} index={index} onIndex={setIndex} />
    </div>
  );
}
