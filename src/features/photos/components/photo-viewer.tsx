import { useEffect, useRef } from 'react';
import { Button } from '@/components/ui/button';
import type { ListedPhoto } from '../api/get-photos';
import { PhotoImage } from './photo-image';

interface PhotoViewerProps {
  requestId: string;
  photos: ListedPhoto[];
  index: number | null;
  onIndex: (index: number | null) => void;
}

/** One photo large, stepping through the request's photos with the buttons or the arrow keys. */
export function PhotoViewer({ requestId, photos, index, onIndex }: PhotoViewerProps) {
  const dialog = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    if (index === null) dialog.current?.close();
    else if (!dialog.current?.open) dialog.current?.showModal();
  }, [index]);
  const step = (by: number) => {
    if (index !== null) onIndex((index + by + photos.length) % photos.length);
  };
  const current = index === null ? null : photos[index];
  return (
    <dialog
      ref={dialog}
      onClose={() => onIndex(null)}
      aria-label="Photo viewer"
      onKeyDown={(e) => {
        if (e.key === 'ArrowRight') step(1);
        if (e.key === 'ArrowLeft') step(-1);
      }}
      className="m-auto w-[min(64rem,95vw)] rounded-lg p-0 backdrop:bg-black/70"
    >
      {current && (
        <figure className="bg-stone-900 text-white">
          <PhotoImage
            requestId={requestId}
            photo={current}
            className="max-h-[75vh] w-full object-contain"
            fileLink={(href) => (
              <a href={href} target="_blank" rel="noreferrer" className="font-semibold text-pine-800 underline">
                Open {current.fileName}
              </a>
            )}
          />
          <figcaption className="flex flex-wrap items-center justify-between gap-3 bg-white p-3 text-sm text-stone-800">
            <span>
              <span className="font-semibold">{current.caption || current.fileName}</span>
              {current.gpsLat !== null && current.gpsLng !== null && (
                <span className="ml-2 text-stone-600">
                  taken at {current.gpsLat.toFixed(5)}, {current.gpsLng.toFixed(5)}
                </span>
              )}
              <span className="ml-2 text-stone-600">
                {(index ?? 0) + 1} of {photos.length}
              </span>
            </span>
            <span className="flex gap-2">
              <Button variant="secondary" onClick={() => step(-1)}>
                Previous
              </Button>
              <Button variant="secondary" onClick={() => step(1)}>
                Next
              </Button>
              <Button onClick={() => onIndex(null)}>Close</Button>
            </span>
          </figcaption>
        </figure>
      )}
    </dialog>
  );
}
