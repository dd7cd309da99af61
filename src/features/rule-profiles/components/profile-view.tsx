import type { RuleProfile } from '@shared/engine';
import { profileGroups, profileValueText, sourceKeyOf } from '@shared/rule-profiles/profile-fields';

/** A published version, read only: each value with its source note. */
export function ProfileView({ profile }: { profile: RuleProfile }) {
  return (
    <div className="space-y-5">
      {profileGroups.map((group) => (
        <section key={group.title}>
          <h3 className="mb-1 font-bold text-pine-900">{group.title}</h3>
          <dl className="divide-y divide-stone-100 text-sm">
            {group.fields.map((f) => (
              <div key={f.path} className="grid gap-1 py-1 sm:grid-cols-[2fr_1fr_3fr]">
                <dt className="text-stone-700">{f.label}</dt>
                <dd className="font-mono">{profileValueText(profile, f)}</dd>
                <dd className="text-stone-600">{profile.sources[sourceKeyOf(f)] ?? ''}</dd>
              </div>
            ))}
          </dl>
        </section>
      ))}
    </div>
  );
}
