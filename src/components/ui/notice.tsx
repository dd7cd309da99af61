import type { ReactNode } from 'react';
import { ApiError } from '@/lib/api-client';

const tones = {
  info: 'border-pine-200 bg-pine-50 text-pine-900',
  warn: 'border-tape bg-amber-50 text-amber-950',
  error: 'border-clay/40 bg-red-50 text-red-900',
};

export function Notice({
  tone = 'info',
  children,
  title,
}: {
  tone?: keyof typeof tones;
  title?: ReactNode;
  children?: ReactNode;
}) {
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={`rounded-md border px-4 py-3 text-sm ${tones[tone]}`}>
      {title && <p className="font-semibold">{title}</p>}
      {children}
    </div>
  );
}

/**
 * An error away from any one field. Fields the form shows beside themselves (`shownBeside`) are left out of the
 * list; any other field is named by its label, never by its key.
 */
export function ErrorNotice({ error, shownBeside = [] }: { error: unknown; shownBeside?: readonly string[] }) {
  if (!error) return null;
  const api = error instanceof ApiError ? error : undefined;
  const fields = api ? Object.entries(api.fields).filter(([field]) => !shownBeside.includes(field)) : [];
  // A 400 of the shared kind already says every field in its sentence; that sentence is rewritten for those left.
  const plainSentence = api?.code === 'invalid_input';
  const allBeside = plainSentence && Object.keys(api.fields).length > 0 && fields.length === 0;
  const message = allBeside
    ? 'Please correct the fields marked below.'
    : error instanceof Error
      ? error.message
      : 'Something went wrong.';
  return (
    <Notice tone="error" title={message}>
      {plainSentence && fields.length > 1 && (
        <ul className="mt-1 list-disc pl-5">
          {fields.map(([field, text]) => (
            <li key={field}>
              {api!.labelOf(field)}: {text}
            </li>
          ))}
        </ul>
      )}
    </Notice>
  );
}

export function Loading({ label = 'Loading…' }: { label?: string }) {
  return (
    <p role="status" className="py-6 text-stone-600">
      {label}
    </p>
  );
}
