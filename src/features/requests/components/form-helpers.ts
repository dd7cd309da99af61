import { useEffect } from 'react';
import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from '@/lib/api-client';

/** Number inputs: an empty box means "not known" (null); anything else goes to the schema to judge. */
export const numberOrNull = (value: unknown) => {
  if (value === '' || value === null || value === undefined) return null;
  return Number(String(value).trim().replace(',', '.'));
};

/**
 * A half-filled step for a draft save: unanswered choices come out of the form as null, and a draft leaves
 * them out instead (a saved step is replaced whole, so a missing answer is simply not given yet).
 */
export function answeredOnly<T extends object>(values: T): Partial<T> {
  return Object.fromEntries(Object.entries(values).filter(([, v]) => v !== null && v !== undefined)) as Partial<T>;
}

/** The server names fields like `site.address`: split them by wizard step, without the step's prefix. */
export function fieldsByStep(error: unknown): Record<'site' | 'entrance', Record<string, string>> | null {
  if (!(error instanceof ApiError) || Object.keys(error.fields).length === 0) return null;
  const split = { site: {} as Record<string, string>, entrance: {} as Record<string, string> };
  for (const [name, message] of Object.entries(error.fields)) {
    const [step, field] = name.split('.');
    if ((step === 'site' || step === 'entrance') && field) split[step][field] ??= message;
  }
  return split;
}

/** Shows the server's messages next to their fields and moves focus to the first one. */
export function useServerFields<T extends FieldValues>(
  fields: Record<string, string> | undefined,
  setError: UseFormSetError<T>,
) {
  useEffect(() => {
    Object.entries(fields ?? {}).forEach(([name, message], index) => {
      setError(name as Path<T>, { type: 'server', message }, { shouldFocus: index === 0 });
    });
  }, [fields, setError]);
}

export interface StepSnapshot {
  values: object;
  dirty: boolean;
}

export interface StepProps<T> {
  initial: Partial<T>;
  serverFields?: Record<string, string>;
  saving: boolean;
  /** Lets the wizard read unsaved answers when the person leaves the page. */
  /** Hands the wizard a way to read the step's unsaved answers when the person leaves. */
  keepSnapshot: (read: () => StepSnapshot) => void;
  onNext: (values: T) => void;
  onBack?: (values: Partial<T>) => void;
}
