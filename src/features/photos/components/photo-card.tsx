import { useId, useState } from 'react';
import { captionSuggestions } from '@shared/requests/photo-rules';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/notice';
import type { ListedPhoto } from '../api/get-photos';
import { useRemovePhoto } from '../api/remove-photo';
import { useUpdateCaption } from '../api/update-caption';
import { PhotoImage } from './photo-image';

interface PhotoCardProps {
  photo: ListedPhoto;
  requestId: string;
  editable: boolean;
  onOpen: () => void;
}

/** One stored photo: the picture (opening the large viewer), its caption (editable while the request is), and a way to take it out. */
export function PhotoCard({ photo, requestId, editable, onOpen }: PhotoCardProps) {
  const captionId = useId();
  const [caption, setCaption] = useState(photo.caption);
  const [unshowable, setUnshowable] = useState(false);
  const update = useUpdateCaption(requestId);
  const remove = useRemovePhoto(requestId);
  const saveCaption = () => {
    if (caption.trim() !== photo.caption) update.mutate({ photoId: photo.id, caption });
  };
  return (
    <li className="flex flex-col gap-2 rounded-md border border-stone-200 bg-white p-2">
      <button
        type="button"
        onClick={onOpen}
        className="block w-full overflow-hidden rounded bg-stone-100 text-left hover:ring-2 hover:ring-pine-500"
      >
        <PhotoImage
          requestId={requestId}
          photo={photo}
          className="aspect-[4/3] w-full object-cover"
          onUnshowable={() => setUnshowable(true)}
        />
        {!editable && (
          <span className="block truncate px-2 py-1 text-sm text-stone-700">{photo.caption || photo.fileName}</span>
        )}
      </button>
      {unshowable && (
        <a href={photo.url} target="_blank" rel="noreferrer" className="text-sm font-semibold text-pine-800 underline">
          Open {photo.fileName}
        </a>
      )}
      {editable && (
        <div className="flex flex-col gap-1">
          <label htmlFor={captionId} className="text-xs font-semibold text-stone-700">
            What does “{photo.fileName}” show?
          </label>
          <input
            id={captionId}
            list={`${captionId}-ideas`}
            value={caption}
            maxLength={200}
            onChange={(e) => setCaption(e.target.value)}
            onBlur={saveCaption}
            onKeyDown={(e) => {
              if (e.key === 'Enter') {
                e.preventDefault();
                saveCaption();
              }
            }}
            className="rounded border border-stone-300 px-2 py-1 text-sm"
          />
          <datalist id={`${captionId}-ideas`}>
            {captionSuggestions.map((s) => (
              <option key={s} value={s} />
            ))}
          </datalist>
          {update.isSuccess && !update.isPending && (
            <p className="text-xs text-pine-700" role="status">
              Caption saved.
            </p>
          )}
          <Button
            variant="quiet"
            className="self-start px-0"
            disabled={remove.isPending}
            onClick={() => remove.mutate(photo.id)}
          >
            {remove.isPending ? 'Removing…' : `Remove ${photo.fileName}`}
          </Button>
        </div>
      )}
      <ErrorNotice error={update.error ?? remove.error} />
    </li>
  );
}
