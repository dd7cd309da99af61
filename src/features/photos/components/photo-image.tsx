import { useState, type ReactNode } from 'react';
import { UnshowablePhoto } from '@/components/ui/unshowable-photo';
import { getPhotoUrl, type ListedPhoto } from '../api/get-photos';

interface PhotoImageProps {
  requestId: string;
  photo: ListedPhoto;
  className: string;
  /** How to open the file when the browser cannot draw it, where the place allows a link. */
  fileLink?: (href: string) => ReactNode;
  onUnshowable?: () => void;
}

/**
 * An image whose presigned link may have run out: on a load error it asks once for a fresh link. When the fresh
 * link fails too, the browser cannot draw the file (HEIC outside Safari), and it says so.
 */
export function PhotoImage({ requestId, photo, className, fileLink, onUnshowable }: PhotoImageProps) {
  const [src, setSrc] = useState<string | undefined>(photo.url);
  const [retried, setRetried] = useState(false);
  const [unshowable, setUnshowable] = useState(false);
  // A new link from the server starts over: it may load where the last one did not.
  const [shownUrl, setShownUrl] = useState(photo.url);
  if (photo.url !== shownUrl) {
    setShownUrl(photo.url);
    setSrc(photo.url);
    setRetried(false);
    setUnshowable(false);
  }
  const giveUp = () => {
    setUnshowable(true);
    onUnshowable?.();
  };
  const refresh = () => {
    if (retried) {
      giveUp();
      return;
    }
    setRetried(true);
    // A link signed in the same second is the same link, and would not load again: the file itself is the trouble.
    getPhotoUrl(requestId, photo.id)
      .then((r) => (r.url === src ? giveUp() : setSrc(r.url)))
      .catch(() => setSrc(undefined));
  };
  if (!src)
    return (
      <span className={`${className} grid place-items-center bg-stone-100 text-xs text-stone-600`}>
        Photo unavailable
      </span>
    );
  if (unshowable)
    return (
      <UnshowablePhoto contentType={photo.contentType} className={className}>
        {fileLink?.(src)}
      </UnshowablePhoto>
    );
  return (
    <img
      src={src}
      alt={photo.caption || `Site photo ${photo.fileName}`}
      onError={refresh}
      className={className}
      loading="lazy"
    />
  );
}
