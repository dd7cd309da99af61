import { useId, useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextArea } from '@/components/ui/field';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useMessages } from '../api/get-messages';
import { usePostMessage } from '../api/post-message';

const stamp = (iso: string) => new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });

/**
 * The shared conversation on a request: the property owner with the office, and the crew lead once a crew holds
 * the job. Only what everyone on it may read ever reaches this list.
 */
export function RequestMessages({ requestId, canWrite, writeLabel = 'Write to the office' }: { requestId: string; canWrite: boolean; writeLabel?: string }) {
  const inputId = useId();
  const { data, error, isPending } = useMessages(requestId);
  const post = usePostMessage(requestId);
  const [text, setText] = useState('');
  const fieldError = post.error instanceof ApiError ? post.error.fields.body : undefined;
  const send = (event: FormEvent) => {
    event.preventDefault();
    post.mutate(text, { onSuccess: () => setText('') });
  };
  return (
    <div className="space-y-4">
      {isPending ? <Loading /> : error ? <ErrorNotice error={error} /> : data.messages.length === 0 ? (
        <p className="text-sm text-stone-500">No messages yet.</p>
      ) : (
        <ul className="space-y-3" aria-label="Messages">
          {data.messages.map((m) => (
            <li key={m.id} className={`max-w-prose rounded-lg border px-3 py-2 ${m.mine ? 'ml-auto border-pine-200 bg-pine-50' : 'border-stone-200 bg-white'}`}>
              <p className="text-xs text-stone-500">{m.mine ? 'You' : m.authorName} · <time dateTime={m.createdAt}>{stamp(m.createdAt)}</time></p>
              <p className="whitespace-pre-line text-sm">{m.body}</p>
            </li>
          ))}
        </ul>
      )}
      {canWrite && (
        <form onSubmit={send} noValidate className="space-y-2">
          <label htmlFor={inputId} className="text-sm font-semibold">{writeLabel}</label>
          <TextArea id={inputId} value={text} onChange={(e) => setText(e.target.value)} maxLength={4000}
            aria-invalid={Boolean(fieldError)} aria-describedby={fieldError ? `${inputId}-error` : undefined} />
          {fieldError && <p id={`${inputId}-error`} className="text-sm font-medium text-clay">{fieldError}</p>}
          {post.error && !fieldError ? <ErrorNotice error={post.error} /> : null}
          <Button type="submit" disabled={post.isPending || text.trim() === ''}>{post.isPending ? 'Sending…' : 'Send message'}</Button>
        </form>
      )}
    </div>
  );
}
