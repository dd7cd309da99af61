import { z } from 'zod';

/**
 * The one mapping from a validation problem to words a person reads beside a field: zod's stock messages ("Too big:
 * expected number to be <=50", "Invalid input: expected string, received undefined") become plain ones ("must be
 * 50 or less", "must be filled in"); a message a schema wrote itself is kept. The server's 400s, the engine's
 * refusals and the client's own form checks all go through `plainIssueMessage`, and name the field by `labelAt`.
 */

/** The label a field has on screen, for schemas whose form is not drawn from another registry. */
export const fieldLabel = z.registry<{ label: string }>();

/** Other registries whose entries carry a `label` (the status change form's `fieldText`) join the lookup here. */
const labelRegistries: { get(schema: z.ZodType): { label: string } | undefined }[] = [fieldLabel];
export function readLabelsFrom(registry: { get(schema: z.ZodType): { label: string } | undefined }) {
  if (!labelRegistries.includes(registry)) labelRegistries.push(registry);
}

const typeWords: Record<string, string> = {
  string: 'must be text',
  number: 'must be a number',
  int: 'must be a whole number',
  bigint: 'must be a whole number',
  boolean: 'must be yes or no',
  array: 'must be a list',
  object: 'must be a group of fields',
  date: 'must be a date',
};

const formatWords: Record<string, string> = {
  email: 'must be an e-mail address, like name@example.com',
  url: 'must be a web address',
  uuid: 'must be a valid id',
  guid: 'must be a valid id',
  date: 'must be a date, like Dec 2, 2026',
  datetime: 'must be a date and time',
  time: 'must be a time of day',
  regex: 'is not in the form expected',
};

const stock = /^(Invalid|Too (big|small)|Unrecognized key|Expected )/;

const amount = (n: number | bigint) =>
  typeof n === 'bigint' ? n.toString() : Number.isInteger(n) ? n.toLocaleString('en-US') : String(n);

function sizeWords(issue: z.core.$ZodIssueTooBig | z.core.$ZodIssueTooSmall, big: boolean): string {
  const limit = big ? (issue as z.core.$ZodIssueTooBig).maximum : (issue as z.core.$ZodIssueTooSmall).minimum;
  const n = amount(limit as number | bigint);
  const inclusive = issue.inclusive !== false;
  switch (issue.origin) {
    case 'string':
      if (!big && Number(limit) <= 1) return 'must be filled in';
      return big ? `must be at most ${n} characters` : `must be at least ${n} characters`;
    case 'array':
    case 'set':
      if (!big && Number(limit) <= 1) return 'must have at least one entry';
      return big ? `must have at most ${n} entries` : `must have at least ${n} entries`;
    case 'file':
      return big ? `must be at most ${n} bytes` : `must be at least ${n} bytes`;
    default:
      if (big) return inclusive ? `must be ${n} or less` : `must be less than ${n}`;
      return inclusive ? `must be ${n} or more` : `must be more than ${n}`;
  }
}

/** Plain words for one zod issue, without the field's name (the label sits beside it). */
export function plainIssueMessage(issue: z.core.$ZodIssue): string {
  if (!stock.test(issue.message)) return issue.message;
  switch (issue.code) {
    case 'invalid_type':
      if (/received undefined$/.test(issue.message)) return 'must be filled in';
      return typeWords[issue.expected] ?? 'is not the kind of value expected here';
    case 'too_big':
      return sizeWords(issue, true);
    case 'too_small':
      return sizeWords(issue, false);
    case 'invalid_format':
      return formatWords[issue.format] ?? 'is not in the form expected';
    case 'not_multiple_of':
      return `must be a multiple of ${amount(issue.divisor as number)}`;
    case 'invalid_value':
    case 'invalid_union':
      return 'is not one of the choices offered';
    case 'unrecognized_keys':
      return `has a field this form does not take (${issue.keys.join(', ')})`;
    case 'invalid_key':
    case 'invalid_element':
      return 'holds a value that is not allowed';
    default:
      return 'is not allowed here';
  }
}

type AnyDef = { type: string } & Record<string, unknown>;
const defOf = (schema: unknown): AnyDef | undefined => (schema as { _zod?: { def?: AnyDef } } | undefined)?._zod?.def;

function ownLabel(schema: z.ZodType): string | undefined {
  for (const registry of labelRegistries) {
    const found = registry.get(schema)?.label;
    if (found) return found.replace(/\s*\(optional\)$/i, '').replace(/\s*—\s*optional$/i, '');
  }
  return undefined;
}

/** Through wrappers (optional, default, pipe...) to the schemas a value at this point is checked by. */
function unwrap(schema: z.ZodType, seen = new Set<unknown>()): z.ZodType[] {
  if (seen.has(schema)) return [];
  seen.add(schema);
  const def = defOf(schema);
  if (!def) return [schema];
  switch (def.type) {
    case 'optional':
    case 'nullable':
    case 'default':
    case 'prefault':
    case 'catch':
    case 'readonly':
    case 'nonoptional':
    case 'success':
      return [schema, ...unwrap(def.innerType as z.ZodType, seen)];
    case 'pipe':
      return [schema, ...unwrap(def.in as z.ZodType, seen), ...unwrap(def.out as z.ZodType, seen)];
    case 'lazy':
      return [schema, ...unwrap((def.getter as () => z.ZodType)(), seen)];
    default:
      return [schema];
  }
}

/** A union's option whose literal fields (such as `action`) the value contradicts is not the one meant. */
function fits(option: z.ZodType, value: unknown): boolean {
  if (!value || typeof value !== 'object') return true;
  for (const inner of unwrap(option)) {
    if (defOf(inner)?.type !== 'object') continue;
    const shape = (inner as unknown as { shape: Record<string, z.ZodType> }).shape;
    for (const [key, field] of Object.entries(shape)) {
      const def = defOf(field);
      if (def?.type === 'literal' && key in value && !(def.values as unknown[]).includes((value as never)[key]))
        return false;
    }
  }
  return true;
}

function children(schema: z.ZodType, key: PropertyKey, value: unknown): z.ZodType[] {
  const found: z.ZodType[] = [];
  for (const inner of unwrap(schema)) {
    const def = defOf(inner);
    if (!def) continue;
    if (def.type === 'object') {
      const shape = (inner as unknown as { shape: Record<string, z.ZodType> }).shape;
      if (typeof key === 'string' && shape[key]) found.push(shape[key]);
    } else if (def.type === 'array' && typeof key === 'number') found.push(def.element as z.ZodType);
    else if (def.type === 'record') found.push(def.valueType as z.ZodType);
    else if (def.type === 'tuple' && typeof key === 'number') {
      const items = def.items as z.ZodType[];
      if (items[key]) found.push(items[key]);
    } else if (def.type === 'union') {
      for (const option of def.options as z.ZodType[])
        if (fits(option, value)) found.push(...children(option, key, value));
    } else if (def.type === 'intersection')
      found.push(...children(def.left as z.ZodType, key, value), ...children(def.right as z.ZodType, key, value));
  }
  return found;
}

/**
 * The on-screen label the schema gives the field at `path`, if it gives one. `value` (what was sent) picks the
 * union's option it was meant for, so a status change's "note" is named as that action's form names it.
 */
export function labelAt(
  schema: z.ZodType | undefined,
  path: readonly PropertyKey[],
  value?: unknown,
): string | undefined {
  if (!schema) return undefined;
  let level: z.ZodType[] = [schema];
  let at = value;
  for (const key of path) {
    const step = typeof key === 'string' && /^\d+$/.test(key) ? Number(key) : key;
    level = level.flatMap((s) => children(s, step, at));
    at = at && typeof at === 'object' ? (at as Record<PropertyKey, unknown>)[step] : undefined;
    if (level.length === 0) return undefined;
  }
  for (const s of level)
    for (const inner of unwrap(s)) {
      const label = ownLabel(inner);
      if (label) return label;
    }
  return undefined;
}

const acronyms: Record<string, string> = {
  id: 'id',
  gps: 'GPS',
  url: 'web address',
  hw: 'HW',
  lat: 'latitude',
  lng: 'longitude',
};

/** "permitExpiresOn" -> "Permit expires on": the last resort for a field no schema or list names. */
export function wordsOfKey(key: string): string {
  const words = key
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/[_-]+/g, ' ')
    .toLowerCase()
    .split(' ')
    .filter(Boolean)
    .map((w) => acronyms[w] ?? w)
    .join(' ');
  return words.charAt(0).toUpperCase() + words.slice(1);
}
