import { useQueryClient } from '@tanstack/react-query';
import { useId, useRef, useState } from 'react';
import { crewPhotoKindLabels, crewPhotoKinds, type CrewPhotoKind } from '@shared/contracts/crew-photos';
import { maxPhotoBytes, photoContentTypes } from '@shared/requests/photo-rules';
import { Button } from '@/components/ui/button';
import { Field, SelectInput, TextInput } from '@/components/ui/field';
import { ErrorNotice, Notice } from '@/components/ui/notice';
import { photoKeys } from '@/lib/query-keys';
import { confirmCrewPhoto } from '../api/confirm-crew-photo';
import { registerCrewPhoto } from '../api/register-crew-photo';
import { readPosition, withoutMetadata } from './photo-metadata';

// Some browsers leave HEIC files without a type; the extension says what they are.
const typeOf = (file: File) => file.type || (/\.heic$/i.test(file.name) ? 'image/heic' : 'application/octet-stream');

/**
 * The crew lead adds a photo: what it shows, an optional caption, and the file from the camera. The position is
 * read and the camera's metadata removed on the phone, as for the owner's photos; the device's key for the photo
 * makes a retry store it once.
 */
export function CrewPhotoUploader({ requestId }: { requestId: string }) {
  const fileId = useId();
  const queryClient = useQueryClient();
  const input = useRef<HTMLInputElement>(null);
  const [kind, setKind] = useState<CrewPhotoKind>('finished_entrance');
  const [caption, setCaption] = useState('');
  const [busy, setBusy] = useState(false);
  const [done, setDone] = useState<string | null>(null);
  const [problem, setProblem] = useState<unknown>(null);

  const send = async (file: File) => {
    setBusy(true);
    setDone(null);
    setProblem(null);
    try {
      const type = typeOf(file);
      const where = await readPosition(file);
      const clean = (await withoutMetadata(file, type)) ?? file;
      const gps = { gpsLat: where?.latitude ?? null, gpsLng: where?.longitude ?? null };
      const ticket = await registerCrewPhoto(requestId, {
        idempotencyKey: crypto.randomUUID(),
        kind,
        fileName: file.name || 'photo',
        contentType: type,
        sizeBytes: clean.size,
        caption: caption.trim() || undefined,
        ...gps,
      });
      if (ticket.upload) {
        const put = await fetch(ticket.upload.url, { method: 'PUT', body: clean, headers: ticket.upload.headers });
        if (!put.ok) throw new Error(`“${file.name}” did not reach storage. Try again.`);
        await confirmCrewPhoto(requestId, ticket.photo.id, gps);
      }
      setDone(`${crewPhotoKindLabels[kind]} photo added${where ? ' with its position' : ''}.`);
      setCaption('');
      if (input.current) input.current.value = '';
      await queryClient.invalidateQueries({ queryKey: photoKeys.crewOfRequest(requestId) });
    } catch (error) {
      setProblem(error);
    } finally {
      setBusy(false);
    }
  };

  return (
    <div className="space-y-3">
      <div className="grid gap-3 sm:grid-cols-2">
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
        <Field label="Caption (optional)">
          {({ id }) => (
            <TextInput id={id} value={caption} maxLength={200} onChange={(e) => setCaption(e.target.value)} />
          )}
        </Field>
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={fileId} className="text-sm font-semibold text-stone-800">
          Photo (JPEG, PNG, WebP or HEIC, up to {maxPhotoBytes / 1024 / 1024} MB)
        </label>
        <input
          id={fileId}
          ref={input}
          type="file"
          accept={[...photoContentTypes, '.heic'].join(',')}
          capture="environment"
          disabled={busy}
          onChange={(e) => {
            const file = e.target.files?.[0];
            if (file) void send(file);
          }}
          className="text-sm"
        />
      </div>
      {busy && <Notice>Sending the photo…</Notice>}
      {done && <Notice>{done}</Notice>}
      <ErrorNotice error={problem} />
      {problem !== null && !busy && (
        <Button variant="secondary" onClick={() => input.current?.click()}>
          Choose the photo again
        </Button>
      )}
    </div>
  );
}
