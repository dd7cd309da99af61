import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { ConfirmButton } from '@/components/ui/confirm-button';
import { Field, SelectInput, TextInput } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import type { ProfileVersion } from '../api/get-jurisdiction';
import { usePublishVersion } from '../api/publish-version';
import { useUpdateDraft } from '../api/update-draft';
import { profileGroups, sourceKeyOf } from '@shared/rule-profiles/profile-fields';
import { fromFormValues, toFormValues } from '../lib/profile-values';

/** A draft version's values, each with its source note; saving keeps it a draft, publishing freezes it. */
export function ProfileForm({ version }: { version: ProfileVersion }) {
  const initial = toFormValues(version.profile);
  const [values, setValues] = useState(initial.values);
  const [sources, setSources] = useState(initial.sources);
  const [changeNote, setChangeNote] = useState(version.changeNote);
  const [localErrors, setLocalErrors] = useState<Record<string, string>>({});
  const [dirty, setDirty] = useState(false);
  const update = useUpdateDraft(version.jurisdictionId);
  const publish = usePublishVersion(version.jurisdictionId);
  const serverErrors = update.error instanceof ApiError ? update.error.fields : {};
  const errorFor = (path: string) => localErrors[path] ?? serverErrors[`profile.${path}`];

  const save = async () => {
    const { profile, errors } = fromFormValues(version.profile, values, sources);
    setLocalErrors(errors);
    if (Object.keys(errors).length > 0) return false;
    await update.mutateAsync({ versionId: version.id, profile, changeNote });
    setDirty(false);
    return true;
  };
  const edit = (setter: typeof setValues, key: string) => (value: string) => {
    setter((v) => ({ ...v, [key]: value }));
    setDirty(true);
  };

  return (
    <form
      className="space-y-6"
      onSubmit={(e) => {
        e.preventDefault();
        void save().catch(() => undefined);
      }}
    >
      {profileGroups.map((group) => (
        <fieldset key={group.title} className="space-y-3 rounded-md border border-stone-200 p-4">
          <legend className="px-1 font-serif text-lg font-bold text-pine-900">{group.title}</legend>
          {group.fields.map((f, i) => {
            const sourceKey = sourceKeyOf(f);
            const showSource = group.fields.findIndex((g) => sourceKeyOf(g) === sourceKey) === i;
            return (
              <div key={f.path} className="grid gap-3 sm:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
                <Field
                  label={`${f.label}${f.unit ? ` (${f.unit})` : ''}${f.optional ? ' — optional' : ''}`}
                  error={errorFor(f.path)}
                >
                  {({ id, describedBy, invalid }) =>
                    f.choices ? (
                      <SelectInput
                        id={id}
                        value={values[f.path]}
                        onChange={(e) => edit(setValues, f.path)(e.target.value)}
                      >
                        {f.choices.map(([v, t]) => (
                          <option key={v} value={v}>
                            {t}
                          </option>
                        ))}
                      </SelectInput>
                    ) : (
                      <TextInput
                        id={id}
                        value={values[f.path]}
                        inputMode={f.text ? 'text' : 'decimal'}
                        aria-describedby={describedBy}
                        aria-invalid={invalid}
                        onChange={(e) => edit(setValues, f.path)(e.target.value)}
                      />
                    )
                  }
                </Field>
                {showSource ? (
                  <Field
                    label={`Source for ${f.sourceKey ? 'the design vehicle' : f.label.toLowerCase()}`}
                    error={serverErrors[`profile.sources.${sourceKey}`]}
                  >
                    {({ id }) => (
                      <TextInput
                        id={id}
                        value={sources[sourceKey] ?? ''}
                        placeholder="Ordinance, standard or practice this comes from"
                        onChange={(e) => edit(setSources, sourceKey)(e.target.value)}
                      />
                    )}
                  </Field>
                ) : (
                  <div />
                )}
              </div>
            );
          })}
        </fieldset>
      ))}
      <Field label="What changed in this version">
        {({ id }) => (
          <TextInput
            id={id}
            value={changeNote}
            onChange={(e) => {
              setChangeNote(e.target.value);
              setDirty(true);
            }}
          />
        )}
      </Field>
      <ErrorNotice error={update.error ?? publish.error} />
      <div className="flex flex-wrap gap-3">
        <Button type="submit" disabled={update.isPending}>
          {update.isPending ? 'Saving…' : 'Save draft'}
        </Button>
        <ConfirmButton
          variant="secondary"
          disabled={publish.isPending || update.isPending}
          question={`Publish version ${version.version}? It is frozen once published, and every new grade check uses it.`}
          confirmLabel={`Yes, publish version ${version.version}`}
          onConfirm={() =>
            void (dirty ? save() : Promise.resolve(true))
              .then((ok) => ok && publish.mutate(version.id))
              .catch(() => undefined)
          }
        >
          Publish version {version.version}
        </ConfirmButton>
        {update.isSuccess && !dirty && (
          <span role="status" className="self-center text-sm text-pine-800">
            Draft saved.
          </span>
        )}
      </div>
      <p className="text-sm text-stone-600">
        Publishing freezes this version and makes it the one new checks use. Checks already saved keep the version they
        were made with.
      </p>
    </form>
  );
}
