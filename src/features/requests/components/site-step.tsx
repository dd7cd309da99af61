import { useEffect } from 'react';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { siteStepSchema, type SiteStep } from '@shared/requests/application-schema';
import { positionKindText, positionKinds, roadOwnerText, roadOwners } from '@shared/requests/choices';
import { Field, TextInput } from '@/components/ui/field';
import { ChoiceGroup } from './choice-group';
import { numberOrNull, useServerFields, type StepProps } from './form-helpers';
import { StepButtons } from './step-buttons';

const emptySite: Partial<SiteStep> = {
  address: '',
  parcelNumber: '',
  roadName: '',
  postedSpeedMph: null,
  positionKind: 'landmark',
  landmark: '',
  distanceFromLandmarkFt: null,
  siteLat: null,
  siteLng: null,
};

export function SiteStepForm({ initial, serverFields, saving, keepSnapshot, onNext }: StepProps<SiteStep>) {
  const form = useForm<z.input<typeof siteStepSchema>, unknown, SiteStep>({
    resolver: zodResolver(siteStepSchema),
    defaultValues: { ...emptySite, ...initial },
    shouldFocusError: true,
  });
  const {
    register,
    handleSubmit,
    watch,
    setError,
    getValues,
    formState: { errors, isDirty },
  } = form;
  // The wizard reads the unsaved answers when the person leaves, never while rendering.
  // Kept by the wizard after this step unmounts, so answers typed just before leaving are still saved.
  useEffect(() => keepSnapshot(() => ({ values: getValues(), dirty: isDirty })));
  useServerFields(serverFields, setError);
  const byLandmark = watch('positionKind') !== 'coordinates';
  const num = { setValueAs: numberOrNull };
  // Registered here, in page order, not inside Field's render prop: the form focuses the first error by
  // registration order, so this order is what puts focus on the topmost field.
  const text = (
    name: 'address' | 'parcelNumber' | 'roadName' | 'landmark',
    label: string,
    hint?: string,
    autoComplete?: string,
  ) => {
    const field = register(name);
    return (
      <Field label={label} hint={hint} error={errors[name]?.message}>
        {({ id, describedBy, invalid }) => (
          <TextInput
            id={id}
            aria-describedby={describedBy}
            aria-invalid={invalid}
            autoComplete={autoComplete}
            {...field}
          />
        )}
      </Field>
    );
  };
  const number = (
    name: 'postedSpeedMph' | 'distanceFromLandmarkFt' | 'siteLat' | 'siteLng',
    label: string,
    hint?: string,
  ) => {
    const field = register(name, num);
    return (
      <Field label={label} hint={hint} error={errors[name]?.message}>
        {({ id, describedBy, invalid }) => (
          <TextInput id={id} inputMode="decimal" aria-describedby={describedBy} aria-invalid={invalid} {...field} />
        )}
      </Field>
    );
  };
  return (
    <form noValidate onSubmit={handleSubmit(onNext)} className="space-y-5" aria-label="The property and the road">
      {text('address', 'Street address of the property', 'Number, street and town, as on your mail.', 'street-address')}
      {text('parcelNumber', 'Parcel number (optional)', 'From your tax bill, if you have it to hand.')}
      {text('roadName', 'Road the entrance joins', 'The public or private road the driveway will meet.')}
      <ChoiceGroup
        legend="Who owns that road, as far as you know?"
        type="radio"
        options={roadOwners}
        labels={roadOwnerText}
        error={errors.roadOwner?.message}
        inputProps={register('roadOwner')}
      />
      {number(
        'postedSpeedMph',
        'Posted speed limit, mph (if known)',
        'The speed sign nearest the entrance. It decides how far drivers must see.',
      )}
      <ChoiceGroup
        legend="Where on the road does the entrance go?"
        type="radio"
        options={positionKinds}
        labels={positionKindText}
        error={errors.positionKind?.message}
        inputProps={register('positionKind')}
      />
      {byLandmark ? (
        <div className="grid gap-4 sm:grid-cols-2">
          {text('landmark', 'Landmark', 'Something the office can find: a mailbox, a crossroad, a barn.')}
          {number('distanceFromLandmarkFt', 'Distance from the landmark, ft', 'Pacing it out is close enough.')}
        </div>
      ) : (
        <div className="grid gap-4 sm:grid-cols-2">
          {number('siteLat', 'Latitude', 'Decimal degrees, e.g. 44.2601. A photo taken on site can fill this in.')}
          {number('siteLng', 'Longitude', 'Decimal degrees, e.g. -72.5754 (west is negative).')}
        </div>
      )}
      <StepButtons saving={saving} />
    </form>
  );
}
