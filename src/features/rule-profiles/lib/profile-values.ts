import type { RuleProfile } from '@shared/engine';
import { allFields, sourceKeyOf, valueAt } from '@shared/rule-profiles/profile-fields';

export type FormValues = Record<string, string>;

export function toFormValues(profile: RuleProfile): { values: FormValues; sources: FormValues } {
  const values: FormValues = {};
  const sources: FormValues = {};
  for (const f of allFields) {
    const v = valueAt(profile, f.path);
    values[f.path] = v === undefined || v === null ? (f.fallback ?? '') : String(v);
    sources[sourceKeyOf(f)] = profile.sources[sourceKeyOf(f)] ?? '';
  }
  return { values, sources };
}

function setAt(target: Record<string, unknown>, path: string, value: unknown) {
  const keys = path.split('.');
  let node = target;
  for (const key of keys.slice(0, -1)) {
    node[key] = { ...((node[key] as Record<string, unknown> | undefined) ?? {}) };
    node = node[key] as Record<string, unknown>;
  }
  const last = keys[keys.length - 1];
  if (value === undefined) delete node[last];
  else node[last] = value;
}

/**
 * The form back into a profile. A box that is not a number is reported here; blank optional limits are dropped
 * (the rule is then "not checked"), and everything else is left to the server's schema to judge.
 */
export function fromFormValues(
  base: RuleProfile,
  values: FormValues,
  sources: FormValues,
): { profile: Record<string, unknown>; errors: FormValues } {
  const profile: Record<string, unknown> = structuredClone(base) as unknown as Record<string, unknown>;
  const errors: FormValues = {};
  for (const f of allFields) {
    const text = (values[f.path] ?? '').trim();
    if (f.text || f.choices) setAt(profile, f.path, text);
    else if (!text) setAt(profile, f.path, f.optional ? undefined : null);
    else if (!Number.isFinite(Number(text))) errors[f.path] = `"${text}" is not a number`;
    else setAt(profile, f.path, Number(text));
  }
  const notes: Record<string, string> = { ...base.sources };
  for (const [key, note] of Object.entries(sources)) {
    if (note.trim()) notes[key] = note.trim();
    else delete notes[key];
  }
  profile.sources = notes;
  return { profile, errors };
}
