import { useQueryClient } from '@tanstack/react-query';
import { lazy, Suspense, useState } from 'react';
import { maxPhotosPerRequest } from '@shared/requests/photo-rules';
import { Button } from '@/components/ui/button';
import { Loading, Notice } from '@/components/ui/notice';
import { photoKeys } from '@/lib/query-keys';
import { usePhotos } from '../api/get-photos';
import { PhotoGallery } from './photo-gallery';

// The uploader carries most of the client's weight, so it loads only when someone reaches the photos step.
const PhotoUploader = lazy(() => import('./photo-uploader'));

interface PhotoStepProps {
  requestId: string;
  /** Absent once the answers can no longer change: then a photo's position is not offered. */
  onUsePosition?: (lat: number, lng: number) => Promise<void>;
  onDeclinePosition?: () => Promise<void>;
  /** The site position already given: a photo's position is offered only while there is none. */
  position?: { lat: number; lng: number } | null;
  /** The owner already said no to a photo's position. */
  positionDeclined?: boolean;
}

/** Adding photos: what the office needs to see, the upload area, and what is already stored. */
export function PhotoStep({
  requestId,
  onUsePosition,
  onDeclinePosition,
  position = null,
  positionDeclined = false,
}: PhotoStepProps) {
  const queryClient = useQueryClient();
  const photos = usePhotos(requestId).data?.photos;
  const stored = photos?.length ?? 0;
  const [problems, setProblems] = useState<string[]>([]);
  const [fresh, setFresh] = useState<{ lat: number; lng: number } | null>(null);
  const [used, setUsed] = useState(false);
  const [answering, setAnswering] = useState(false);
  // The offer stays until it is answered: a stored photo's position is offered again when the owner comes back.
  const storedWithPosition = photos?.find((p) => p.gpsLat !== null && p.gpsLng !== null);
  const offer =
    fresh ?? (storedWithPosition ? { lat: storedWithPosition.gpsLat!, lng: storedWithPosition.gpsLng! } : null);
  const offered = Boolean(offer && onUsePosition && !position && !positionDeclined && !used);
  const refresh = () => queryClient.invalidateQueries({ queryKey: photoKeys.ofRequest(requestId) });
  const answer = async (use: boolean) => {
    if (!offer) return;
    setAnswering(true);
    try {
      if (use && onUsePosition) {
        await onUsePosition(offer.lat, offer.lng);
        setUsed(true);
      } else if (!use && onDeclinePosition) await onDeclinePosition();
    } finally {
      setAnswering(false);
    }
  };
  return (
    <div className="space-y-4">
      <p className="text-stone-700">
        Photos save the office a trip. Stand at the road edge where the entrance will go and take: the road to the left,
        the road to the right, the ditch, and the ground towards the house. Up to {maxPhotosPerRequest} photos.
      </p>
      {offered && offer && (
        <Notice title="A photo knows where it was taken">
          <p>
            {offer.lat.toFixed(5)}, {offer.lng.toFixed(5)}. Use this as the position of the entrance? Only the position
            is kept, nothing else from the photo.
          </p>
          <div className="mt-2 flex flex-wrap gap-2">
            <Button variant="secondary" disabled={answering} onClick={() => void answer(true)}>
              Use this position
            </Button>
            {onDeclinePosition && (
              <Button variant="quiet" disabled={answering} onClick={() => void answer(false)}>
                No, the entrance is not there
              </Button>
            )}
          </div>
        </Notice>
      )}
      {used && <Notice>The site position is now set from your photo. You can change it in step 1.</Notice>}
      {problems.map((p) => (
        <Notice key={p} tone="error">
          {p}
        </Notice>
      ))}
      {stored >= maxPhotosPerRequest ? (
        <Notice tone="warn">This request has the most photos it can take. Remove one to add another.</Notice>
      ) : (
        <Suspense fallback={<Loading label="Loading the uploader…" />}>
          <PhotoUploader
            requestId={requestId}
            room={maxPhotosPerRequest - stored}
            onStored={() => void refresh()}
            onPosition={(lat, lng) => setFresh((current) => current ?? { lat, lng })}
            onProblem={(message) => setProblems((list) => [...list, message])}
          />
        </Suspense>
      )}
      <PhotoGallery requestId={requestId} editable />
    </div>
  );
}
