import { ErrorNotice, Loading } from '@/components/ui/notice';
import { usePhotos } from '../api/get-photos';
import { PhotoCard } from './photo-card';

/** The request's stored photos, shown through short-lived links the server signs for people allowed to see them. */
export function PhotoGallery({ requestId, editable = false }: { requestId: string; editable?: boolean }) {
  const { data, error, isPending } = usePhotos(requestId);
  if (isPending) return <Loading label="Loading photos…" />;
  if (error) return <ErrorNotice error={error} />;
  if (data.photos.length === 0) return <p className="text-sm text-stone-500">No photos yet.</p>;
  return (
    <div>
      <p className="mb-2 text-sm text-stone-600">{data.photos.length === 1 ? '1 photo' : `${data.photos.length} photos`}</p>
      <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3" aria-label="Site photos">
        {data.photos.map((photo) => <PhotoCard key={photo.id} photo={photo} requestId={requestId} editable={editable} />)}
      </ul>
    </div>
  );
}
