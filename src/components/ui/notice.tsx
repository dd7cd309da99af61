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

export function ErrorNotice({ error }: { error: unknown }) {
  if (!error) return null;
  const message = error instanceof Error ? error.message : 'Something went wrong.';
  const fields = error instanceof ApiError ? Object.entries(error.fields) : [];
  return (
    <Notice tone="error" title={message}>
      {fields.length > 0 && (
        <ul className="mt-1 list-disc pl-5">
          {fields.map(([field, text]) => (
            <li key={field}>
              <span className="font-mono">{field}</span>: {text}
            </li>
          ))}
        </ul>
      )}
    </Notice>
  );
}

export function Loading({ label = 'Loading…' }: { label?: string }) {
  return (
    <p role="status" className="py-6 text-stone-500">
      {label}
    </p>
  );
}
