import { useState, type FormEvent } from 'react';
import { sitePositionLabels } from '@shared/contracts/requests';
import { Button } from '@/components/ui/button';
import { Field, TextInput } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useSetSitePosition } from '../api/set-site-position';

const lookLikeNumber = (text: string) => text.trim() !== '' && Number.isFinite(Number(text));

/** The entrance's position as the office knows it, and a small form to set or correct it. */
export function SitePositionControl({
  requestId,
  lat,
  lng,
}: {
  requestId: string;
  lat: number | null;
  lng: number | null;
}) {
  const [open, setOpen] = useState(false);
  const [latText, setLat] = useState(lat === null ? '' : String(lat));
  const [lngText, setLng] = useState(lng === null ? '' : String(lng));
  const [local, setLocal] = useState<Record<string, string>>({});
  const save = useSetSitePosition();
  const server = save.error instanceof ApiError ? save.error.fields : {};
  const errors = { ...server, ...local };
  const known = lat !== null && lng !== null;
  if (!open)
    return (
      <span className="flex flex-wrap items-center gap-2">
        {known ? (
          <span className="font-mono">
            {lat.toFixed(5)}, {lng.toFixed(5)}
          </span>
        ) : (
          <span className="text-stone-600">Not known: the crews’ board cannot give a distance</span>
        )}
        <Button variant="quiet" onClick={() => setOpen(true)}>
          {known ? 'Change the position' : 'Set the position'}
        </Button>
      </span>
    );
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const found: Record<string, string> = {};
    if (!lookLikeNumber(latText))
      found.lat = `${sitePositionLabels.lat}: enter a number in decimal degrees, e.g. 44.26157.`;
    if (!lookLikeNumber(lngText))
      found.lng = `${sitePositionLabels.lng}: enter a number in decimal degrees, e.g. -72.57538.`;
    setLocal(found);
    if (Object.keys(found).length > 0) return;
    save.mutate({ id: requestId, lat: Number(latText), lng: Number(lngText) }, { onSuccess: () => setOpen(false) });
  };
  return (
    <form onSubmit={submit} noValidate className="space-y-2" aria-label="Site position">
      <div className="grid gap-2 sm:grid-cols-2">
        <Field label={sitePositionLabels.lat} hint="North is +, e.g. 44.26157" error={errors.lat}>
          {({ id, describedBy, invalid }) => (
            <TextInput
              id={id}
              inputMode="decimal"
              aria-describedby={describedBy}
              aria-invalid={invalid}
              value={latText}
              onChange={(e) => setLat(e.target.value)}
            />
          )}
        </Field>
        <Field label={sitePositionLabels.lng} hint="West is −, e.g. -72.57538" error={errors.lng}>
          {({ id, describedBy, invalid }) => (
            <TextInput
              id={id}
              inputMode="decimal"
              aria-describedby={describedBy}
              aria-invalid={invalid}
              value={lngText}
              onChange={(e) => setLng(e.target.value)}
            />
          )}
        </Field>
      </div>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={save.isPending}>
          {save.isPending ? 'Saving…' : 'Save the position'}
        </Button>
        <Button variant="secondary" onClick={() => setOpen(false)}>
          Cancel
        </Button>
      </div>
      {!server.lat && !server.lng && <ErrorNotice error={save.error} />}
    </form>
  );
}
