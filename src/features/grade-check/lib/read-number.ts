import { parseStation } from '@shared/engine';

export type FieldErrors = Record<string, string>;

/** Reads one typed box: blank is "not given" (an error only when required), anything else must be a number. */
export function readNumber(text: string, field: string, errors: FieldErrors, required = false): number | undefined {
  const trimmed = text.trim();
  if (!trimmed) {
    if (required) errors[field] = 'required';
    return undefined;
  }
  const value = Number(trimmed.replace(/,/g, ''));
  if (!Number.isFinite(value)) {
    errors[field] = `"${trimmed}" is not a number`;
    return undefined;
  }
  return value;
}

/** Stations may be typed the trade's way (1+25.5) or as plain feet. */
export function readStation(text: string, field: string, errors: FieldErrors): number | undefined {
  const trimmed = text.trim();
  if (!trimmed) {
    errors[field] = 'required';
    return undefined;
  }
  try {
    return parseStation(trimmed);
  } catch (error) {
    errors[field] = error instanceof Error ? error.message.replace(/^station: /, '') : 'not a station';
    return undefined;
  }
}

/** An error as the box shows it, led by the box's own label so it reads on its own (and when read out). */
export const withLabel = (label: string, error: string | undefined): string | undefined =>
  error ? `${label}: ${error}` : undefined;
