import { useState, type FormEvent } from 'react';
import { roleLabels } from '@shared/workflow/statuses';
import { Button } from '@/components/ui/button';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { useRequestMessages } from '../api/get-request-messages';
import { usePostOfficeMessage } from '../api/post-office-message';
import { formatWhen } from './time-in-status';

/** The conversation with the owner and the office's own notes, told apart on every message. */
export function MessageThread({ requestId }: { requestId: string }) {
  const messages = useRequestMessages(requestId);
  const post = usePostOfficeMessage(requestId);
  const [body, setBody] = useState('');
  const [visibility, setVisibility] = useState<'internal' | 'shared'>('internal');
  const submit = (e: FormEvent) => {
    e.preventDefault();
    post.mutate({ body, visibility }, { onSuccess: () => setBody('') });
  };
  return (
    <div className="space-y-4">
      {messages.isPending && <Loading />}
      {messages.error && <ErrorNotice error={messages.error} />}
      <ol className="space-y-3">
        {messages.data?.messages.map((m) => (
          <li key={m.id} className={`rounded-md border p-3 ${m.internal ? 'border-dashed border-tape-dark bg-amber-50' : 'border-stone-200 bg-white'}`}>
            <div className="mb-1 flex flex-wrap items-center gap-2 text-xs text-stone-600">
              <span className="font-semibold text-stone-800">{m.authorName}</span>
              <span>{roleLabels[m.authorRole]}</span>
              <span>{formatWhen(m.createdAt)}</span>
              <span className={`rounded px-1.5 py-0.5 font-semibold ${m.internal ? 'bg-tape text-pine-900' : 'bg-pine-50 text-pine-800'}`}>
                {m.internal ? 'Internal note' : 'Shared with the owner'}
              </span>
            </div>
            <p className="whitespace-pre-wrap">{m.body}</p>
          </li>
        ))}
        {messages.data?.messages.length === 0 && <li className="text-stone-500">No messages yet.</li>}
      </ol>
      <form onSubmit={submit} className="space-y-2" aria-label="Write a message">
        <label className="block text-sm font-semibold text-stone-800" htmlFor="office-message">Message</label>
        <textarea id="office-message" rows={3} value={body} onChange={(e) => setBody(e.target.value)} required
          className="w-full rounded-md border border-stone-300 bg-white px-3 py-2" />
        <fieldset className="flex flex-wrap gap-4 text-sm">
          <legend className="sr-only">Who can read it</legend>
          <label className="flex items-center gap-2">
            <input type="radio" name="visibility" checked={visibility === 'internal'} onChange={() => setVisibility('internal')} className="accent-pine-700" />
            Internal note (office only)
          </label>
          <label className="flex items-center gap-2">
            <input type="radio" name="visibility" checked={visibility === 'shared'} onChange={() => setVisibility('shared')} className="accent-pine-700" />
            Shared with the property owner
          </label>
        </fieldset>
        <p className="text-xs text-stone-600">
          {visibility === 'internal'
            ? 'Only the office sees internal notes; nobody is e-mailed.'
            : 'The property owner, and the crew lead once a crew holds the job, get an e-mail with this message.'}
        </p>
        {post.error && <ErrorNotice error={post.error} />}
        <Button type="submit" disabled={post.isPending || !body.trim()}>{visibility === 'internal' ? 'Save internal note' : 'Send to the owner'}</Button>
      </form>
    </div>
  );
}
