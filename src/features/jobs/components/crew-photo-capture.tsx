import { useRef, useState, type FormEvent } from 'react';
import { crewPhotoKindLabels, crewPhotoKinds, type CrewPhotoKind } from '@shared/contracts/crew-photos';
import { Button } from '@/components/ui/button';
import { Field, SelectInput, TextInput } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { addToOutbox } from '../outbox/use-outbox';

/** What the screen hands in to ready a photo: the camera's metadata removed, its position read first. */
export type PreparePhoto = (
  file: File,
  type: string,
) => Promise<{ blob: Blob; position?: { latitude: number; longitude: number } }>;

// Some browsers leave HEIC files without a type; the extension says what they are.
const typeOf = (file: File) => file.type || (/\.heic$/i.test(file.name) ? 'image/heic' : '');

const accepted = ['image/jpeg', 'image/png', 'image/webp', 'image/heic'];

/**
 * A crew photo is kept on the phone first and sent from the queue, signal or not: the same path online and offline,
 * so a photo taken at a site with no signal is never a special case.
 */
export function CrewPhotoCapture({
  requestId,
  jobReference,
  userId,
  prepare,
}: {
  requestId: string;
  jobReference: string;
  userId: string;
  prepare: PreparePhoto;
}) {
  const [kind, setKind] = useState<CrewPhotoKind>('finished_entrance');
  const [caption, setCaption] = useState('');
  const [problem, setProblem] = useState<string>();
  const [added, setAdded] = useState<string>();
  const [busy, setBusy] = useState(false);
  const [chosen, setChosen] = useState<string>();
  const fileInput = useRef<HTMLInputElement>(null);

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const file = fileInput.current?.files?.[0];
    setAdded(undefined);
    if (!file) return setProblem('choose or take a photo first');
    const type = typeOf(file);
    if (!accepted.includes(type)) return setProblem('must be a JPEG, PNG, WebP or HEIC image');
    setProblem(undefined);
    setBusy(true);
    try {
      const { blob, position } = await prepare(file, type);
      await addToOutbox({
        key: crypto.randomUUID(),
        type: 'photo',
        photo: {
          blob,
          fileName: file.name,
          contentType: type,
          sizeBytes: blob.size,
          kind,
          caption: caption.trim() || undefined,
          gpsLat: position?.latitude,
          gpsLng: position?.longitude,
        },
        userId,
        requestId,
        jobReference,
        createdAt: new Date().toISOString(),
        state: 'waiting',
        attempts: 0,
        nextTryAt: Date.now(),
      });
      setAdded(file.name);
      setCaption('');
      if (fileInput.current) fileInput.current.value = '';
      setChosen(undefined);
    } finally {
      setBusy(false);
    }
  };

  return (
    <form onSubmit={(e) => void submit(e)} noValidate className="space-y-4 text-base">
      <Field label="What the photo shows">
        {({ id }) => (
          <SelectInput id={id} value={kind} onChange={(e) => setKind(e.target.value as CrewPhotoKind)}>
            {crewPhotoKinds.map((k) => (
              <option key={k} value={k}>
                {crewPhotoKindLabels[k]}
              </option>
            ))}
          </SelectInput>
        )}
      </Field>
      <Field label="Photo" error={problem}>
        {({ id, describedBy, invalid }) => (
          // The browser's own file button carries its stock words; ours says what to do, the input stays for
          // screen readers and the keyboard.
          <div className="flex flex-wrap items-center gap-3">
            <input
              id={id}
              ref={fileInput}
              type="file"
              accept={[...accepted, '.heic'].join(',')}
              capture="environment"
              aria-describedby={describedBy}
              aria-invalid={invalid}
              onChange={(e) => setChosen(e.target.files?.[0]?.name)}
              className="peer sr-only"
            />
            <span
              aria-hidden="true"
              onClick={() => fileInput.current?.click()}
              className="inline-flex min-h-12 cursor-pointer items-center rounded-md border border-pine-200 bg-white px-5 font-semibold text-pine-800 peer-focus-visible:outline-3 peer-focus-visible:outline-tape-dark"
            >
              Take or choose a photo
            </span>
            <span className="text-stone-700">{chosen ?? 'No photo chosen yet'}</span>
          </div>
        )}
      </Field>
      <Field label="Caption (optional)">
        {({ id }) => <TextInput id={id} value={caption} maxLength={200} onChange={(e) => setCaption(e.target.value)} />}
      </Field>
      <Button type="submit" disabled={busy} className="min-h-12 px-6 text-base">
        Add the photo
      </Button>
      {added && (
        <Notice title="Photo kept to send">
          {added} is on this phone without its camera details and goes to the office as soon as there is a signal.
        </Notice>
      )}
    </form>
  );
}
