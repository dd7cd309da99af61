import { useEffect } from 'react';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { entranceStepSchema, type EntranceStep } from '@shared/requests/application-schema';
import {
  drainageKindText,
  drainageKinds,
  entranceUseText,
  entranceUses,
  entranceWorkText,
  entranceWorks,
  timingText,
  timings,
  vehicleKindText,
  vehicleKinds,
} from '@shared/requests/choices';
import { Field, SelectInput, TextArea, TextInput } from '@/components/ui/field';
import { ChoiceGroup } from './choice-group';
import { numberOrNull, useServerFields, type StepProps } from './form-helpers';
import { StepButtons } from './step-buttons';

const emptyEntrance: Partial<EntranceStep> = {
  vehicles: [],
  drivewayLengthFt: null,
  riseToHouseFt: null,
  notes: '',
  timing: 'flexible',
};

export function EntranceStepForm({
  initial,
  serverFields,
  saving,
  keepSnapshot,
  onNext,
  onBack,
}: StepProps<EntranceStep>) {
  const {
    register,
    handleSubmit,
    setError,
    getValues,
    formState: { errors, isDirty },
  } = useForm<z.input<typeof entranceStepSchema>, unknown, EntranceStep>({
    resolver: zodResolver(entranceStepSchema),
    defaultValues: { ...emptyEntrance, ...initial },
    shouldFocusError: true,
  });
  // The wizard reads the unsaved answers when the person leaves, never while rendering.
  // Kept by the wizard after this step unmounts, so answers typed just before leaving are still saved.
  useEffect(() => keepSnapshot(() => ({ values: getValues(), dirty: isDirty })));
  useServerFields(serverFields, setError);
  // Registered in page order (not inside Field's render prop) so the first error to get focus is the topmost.
  const number = (name: 'drivewayLengthFt' | 'riseToHouseFt', label: string, hint: string) => {
    const field = register(name, { setValueAs: numberOrNull });
    return (
      <Field label={label} hint={hint} error={errors[name]?.message}>
        {({ id, describedBy, invalid }) => (
          <TextInput id={id} inputMode="decimal" aria-describedby={describedBy} aria-invalid={invalid} {...field} />
        )}
      </Field>
    );
  };
  const timing = register('timing');
  const notes = register('notes');
  return (
    <form noValidate onSubmit={handleSubmit(onNext)} className="space-y-5" aria-label="The entrance you want">
      <ChoiceGroup
        legend="Is this a new entrance?"
        type="radio"
        options={entranceWorks}
        labels={entranceWorkText}
        error={errors.work?.message}
        inputProps={register('work')}
      />
      <ChoiceGroup
        legend="What will it serve?"
        type="radio"
        options={entranceUses}
        labels={entranceUseText}
        error={errors.use?.message}
        inputProps={register('use')}
      />
      <ChoiceGroup
        legend="Which vehicles will use it?"
        hint="Tick all that apply: long vehicles need wider returns."
        type="checkbox"
        options={vehicleKinds}
        labels={vehicleKindText}
        error={errors.vehicles?.message ?? errors.vehicles?.[0]?.message}
        inputProps={register('vehicles')}
      />
      <div className="grid gap-4 sm:grid-cols-2">
        {number('drivewayLengthFt', 'Rough driveway length, ft (if known)', 'From the road edge to where you park.')}
        {number(
          'riseToHouseFt',
          'Rise from the road to the house, ft (if known)',
          'Negative if the house sits below the road.',
        )}
      </div>
      <ChoiceGroup
        legend="Is there a ditch or culvert along the road here?"
        type="radio"
        options={drainageKinds}
        labels={drainageKindText}
        error={errors.existingDrainage?.message}
        inputProps={register('existingDrainage')}
      />
      <Field label="When would you like the work done?" error={errors.timing?.message}>
        {({ id, describedBy, invalid }) => (
          <SelectInput id={id} aria-describedby={describedBy} aria-invalid={invalid} {...timing}>
            {timings.map((t) => (
              <option key={t} value={t}>
                {timingText[t]}
              </option>
            ))}
          </SelectInput>
        )}
      </Field>
      <Field
        label="Anything else the office should know? (optional)"
        hint="Gates, power lines, soft ground, a neighbour's entrance close by…"
        error={errors.notes?.message}
      >
        {({ id, describedBy, invalid }) => (
          <TextArea id={id} aria-describedby={describedBy} aria-invalid={invalid} {...notes} />
        )}
      </Field>
      <StepButtons saving={saving} onBack={onBack && (() => onBack(getValues() as Partial<EntranceStep>))} />
    </form>
  );
}
