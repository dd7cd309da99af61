import { useEffect, useRef, useState } from 'react';
import { Button } from '@/components/ui/button';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { UnshowablePhoto } from '@/components/ui/unshowable-photo';
import { getPhotoUrl, useRequestPhotos } from '../api/get-request-photos';
import type { OfficePhoto } from '../api/types';

/**
 * An image whose presigned link may have run out: on a load error it asks once for a fresh link. When the fresh
 * link fails too, the browser cannot draw the file (HEIC outside Safari): it says so, and in the large viewer
 * offers the file to open.
 */
function PhotoImage({ requestId, photo, className, offerFile = false }: { requestId: string; photo: OfficePhoto; className: string; offerFile?: boolean }) {
  const [src, setSrc] = useState(photo.url);
  const [retried, setRetried] = useState(false);
  const [unshowable, setUnshowable] = useState(false);
  useEffect(() => { setSrc(photo.url); setRetried(false); setUnshowable(false); }, [photo.url]);
  const refresh = () => {
    if (retried) { setUnshowable(true); return; }
    setRetried(true);
    // A link signed in the same second is the same link, and would not load again: the file itself is the trouble.
    getPhotoUrl(requestId, photo.id).then((r) => (r.url === src ? setUnshowable(true) : setSrc(r.url))).catch(() => setSrc(undefined));
  };
  if (!src) return <div className={`${className} grid place-items-center bg-stone-100 text-xs text-stone-500`}>Photo unavailable</div>;
  if (unshowable) {
    return (
      <UnshowablePhoto contentType={photo.contentType} className={className}>
        {offerFile && <a href={src} target="_blank" rel="noreferrer" className="font-semibold text-pine-800 underline">Open {photo.fileName}</a>}
      </UnshowablePhoto>
    );
  }
  return <img src={src} alt={photo.caption || photo.fileName} onError={refresh} className={className} />;
}

/** The owner's site photos as a grid, with a large viewer to step through them. */
export function PhotoViewer({ requestId }: { requestId: string }) {
  const photos = useRequestPhotos(requestId);
  const [index, setIndex] = useState<number | null>(null);
  const dialog = useRef<HTMLDialogElement>(null);
  const list = photos.data?.photos ?? [];

  useEffect(() => {
    if (index === null) dialog.current?.close();
    else if (!dialog.current?.open) dialog.current?.showModal();
  }, [index]);

  if (photos.isPending) return <Loading label="Loading photos…" />;
  if (photos.error) return <ErrorNotice error={photos.error} />;
  if (list.length === 0) return <p className="text-stone-500">The property owner has not added photos.</p>;

  const step = (by: number) => setIndex((i) => (i === null ? i : (i + by + list.length) % list.length));
  const current = index === null ? null : list[index];
  return (
    <>
      <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-4">
        {list.map((photo, i) => (
          <li key={photo.id}>
            <button type="button" onClick={() => setIndex(i)} className="block w-full overflow-hidden rounded-md border border-stone-200 text-left hover:border-pine-500">
              <PhotoImage requestId={requestId} photo={photo} className="aspect-[4/3] w-full object-cover" />
              <span className="block truncate px-2 py-1 text-xs text-stone-600">{photo.caption || photo.fileName}</span>
            </button>
          </li>
        ))}
      </ul>
      <dialog ref={dialog} onClose={() => setIndex(null)} aria-label="Photo viewer"
        onKeyDown={(e) => { if (e.key === 'ArrowRight') step(1); if (e.key === 'ArrowLeft') step(-1); }}
        className="m-auto w-[min(64rem,95vw)] rounded-lg p-0 backdrop:bg-black/70">
        {current && (
          <figure className="bg-stone-900 text-white">
            <PhotoImage requestId={requestId} photo={current} className="max-h-[75vh] w-full object-contain" offerFile />
            <figcaption className="flex flex-wrap items-center justify-between gap-3 bg-white p-3 text-sm text-stone-800">
              <span>
                <span className="font-semibold">{current.caption || current.fileName}</span>
                {current.gpsLat !== null && current.gpsLng !== null && (
                  <span className="ml-2 text-stone-500">taken at {current.gpsLat.toFixed(5)}, {current.gpsLng.toFixed(5)}</span>
                )}
                <span className="ml-2 text-stone-500">{(index ?? 0) + 1} of {list.length}</span>
              </span>
              <span className="flex gap-2">
                <Button variant="secondary" onClick={() => step(-1)}>Previous</Button>
                <Button variant="secondary" onClick={() => step(1)}>Next</Button>
                <Button onClick={() => setIndex(null)}>Close</Button>
              </span>
            </figcaption>
          </figure>
        )}
      </dialog>
    </>
  );
}
