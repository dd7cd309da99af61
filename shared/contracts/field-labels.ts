import type { z } from 'zod';
import { labelAt, wordsOfKey } from '../errors/issue-words';
import { profileFieldAt } from '../rule-profiles/profile-fields';

/**
 * Labels for fields that many forms share and whose schema carries none of its own. A field that appears on one
 * form gets its label where its schema is written (`fieldLabel` in shared/errors/issue-words.ts).
 */
const commonLabels: Record<string, string> = {
  sizeBytes: 'File size',
  contentType: 'File type',
  fileName: 'File name',
  caption: 'Caption',
  gpsLat: 'Latitude',
  gpsLng: 'Longitude',
  expectedVersion: 'Version you loaded',
  action: 'Action',
  email: 'E-mail',
  name: 'Name',
  role: 'Role',
  disabled: 'Sign-in',
  body: 'Message',
  visibility: 'Who reads it',
  changeNote: 'What changed in this version',
  jurisdictionName: 'Road authority',
  id: 'Id',
};

const unitWords: [RegExp, string][] = [
  [/Ft$/, ' (ft)'],
  [/In$/, ' (in)'],
  [/Percent$/, ' (%)'],
  [/Mph$/, ' (mph)'],
  [/Bytes$/, ''],
];

function keyWords(key: string): string {
  if (commonLabels[key]) return commonLabels[key];
  for (const [suffix, unit] of unitWords) if (suffix.test(key)) return `${wordsOfKey(key.replace(suffix, ''))}${unit}`;
  return wordsOfKey(key);
}

/**
 * The label a person sees for the field at a dotted path: the schema's own label, else the rule profile form's,
 * else a shared list, else the key in words. A row of a list is named by its number ("Shot 4: Station (ft)").
 */
export function fieldLabelOf(path: string, schema?: z.ZodType, value?: unknown): string {
  if (path === '(body)' || path === '') return 'The form';
  const parts = path.split('.');
  const fromSchema = labelAt(schema, parts, value);
  if (fromSchema) return fromSchema;
  const profilePath = parts[0] === 'profile' ? parts.slice(1).join('.') : path;
  const profileField = profileFieldAt(profilePath);
  if (profileField) return profileField.label;
  if (parts[0] === 'profile' && parts[1] === 'sources' && parts.length > 2) {
    const of = profileFieldAt(parts.slice(2).join('.'));
    return `Source for ${of ? of.label.toLowerCase() : keyWords(parts[parts.length - 1]).toLowerCase()}`;
  }
  const last = parts[parts.length - 1];
  const rowAt = parts.findLastIndex((p) => /^\d+$/.test(p));
  if (/^\d+$/.test(last)) return `${keyWords(parts[parts.length - 2] ?? 'entry')}, entry ${Number(last) + 1}`;
  if (rowAt > 0)
    return `${keyWords(parts[rowAt - 1]).replace(/s$/, '')} ${Number(parts[rowAt]) + 1}: ${keyWords(last)}`;
  return keyWords(last);
}

/** Every field of a 400 with its label. */
export function fieldLabelsOf(
  fields: Record<string, string>,
  schema?: z.ZodType,
  value?: unknown,
): Record<string, string> {
  return Object.fromEntries(Object.keys(fields).map((path) => [path, fieldLabelOf(path, schema, value)]));
}

/** The one sentence a 400 answers with: each field by its label and what is allowed, in plain words. */
export function fieldsSentence(fields: Record<string, string>, labels: Record<string, string>): string {
  const parts = Object.entries(fields).map(([path, message]) => ({
    label: labels[path] ?? fieldLabelOf(path),
    message: message.replace(/\.$/, ''),
  }));
  if (parts.length === 0) return 'Something in the form is not valid.';
  if (parts.length === 1) return `${parts[0].label}: ${parts[0].message}.`;
  return `Please check ${parts.length} fields: ${parts.map((p) => `${p.label} (${p.message})`).join('; ')}.`;
}
