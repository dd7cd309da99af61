import { formatMoment } from '@shared/format/dates';
import { useId, useState, type FormEvent } from 'react';
import type { MessageView, MessageVisibility } from '@shared/contracts/messages';
import { roleLabels } from '@shared/workflow/statuses';
import { Button } from '@/components/ui/button';
import { TextArea } from '@/components/ui/field';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useMessages } from '../api/get-messages';
import { usePostMessage } from '../api/post-message';

const stamp = (iso: string) => formatMoment(iso);

interface MessageThreadProps {
  requestId: string;
  /** The office also reads and writes internal notes, told apart on every message, and chooses who reads each one. */
  office?: boolean;
  canWrite?: boolean;
  writeLabel?: string;
}

/**
 * The conversation on a request: the homeowner with the office, and the crew lead once a crew holds the job.
 * Only the office's readers ever receive its internal notes.
 */
export function MessageThread({
  requestId,
  office = false,
  canWrite = true,
  writeLabel = 'Write to the office',
}: MessageThreadProps) {
  const { data, error, isPending } = useMessages(requestId);
  return (
    <div className="space-y-4">
      {isPending ? (
        <Loading />
      ) : error ? (
        <ErrorNotice error={error} />
      ) : data.messages.length === 0 ? (
        <p className="text-sm text-stone-600">No messages yet.</p>
      ) : (
        <ul className="space-y-3" aria-label="Messages">
          {data.messages.map((m) =>
            office ? <OfficeItem key={m.id} message={m} /> : <SharedItem key={m.id} message={m} />,
          )}
        </ul>
      )}
      {canWrite && <WriteForm requestId={requestId} office={office} writeLabel={writeLabel} />}
    </div>
  );
}

function OfficeItem({ message: m }: { message: MessageView }) {
  return (
    <li
      className={`rounded-md border p-3 ${m.internal ? 'border-dashed border-tape-dark bg-amber-50' : 'border-stone-200 bg-white'}`}
    >
      <div className="mb-1 flex flex-wrap items-center gap-2 text-xs text-stone-600">
        <span className="font-semibold text-stone-800">{m.authorName}</span>
        <span>{roleLabels[m.authorRole]}</span>
        <time dateTime={m.createdAt}>{stamp(m.createdAt)}</time>
        <span
          className={`rounded px-1.5 py-0.5 font-semibold ${m.internal ? 'bg-tape text-pine-900' : 'bg-pine-50 text-pine-800'}`}
        >
          {m.internal ? 'Internal note' : 'Shared with the owner'}
        </span>
      </div>
      <p className="whitespace-pre-wrap">{m.body}</p>
    </li>
  );
}

function SharedItem({ message: m }: { message: MessageView }) {
  return (
    <li
      className={`max-w-prose rounded-lg border px-3 py-2 ${m.mine ? 'ml-auto border-pine-200 bg-pine-50' : 'border-stone-200 bg-white'}`}
    >
      <p className="text-xs text-stone-600">
        {m.mine ? 'You' : m.authorName} · <time dateTime={m.createdAt}>{stamp(m.createdAt)}</time>
      </p>
      <p className="whitespace-pre-line text-sm">{m.body}</p>
    </li>
  );
}

function WriteForm({ requestId, office, writeLabel }: { requestId: string; office: boolean; writeLabel: string }) {
  const inputId = useId();
  const post = usePostMessage(requestId);
  const [text, setText] = useState('');
  // The office decides each time; its default keeps a slip of the hand from reaching the homeowner.
  const [visibility, setVisibility] = useState<MessageVisibility>('internal');
  const fieldError = post.error instanceof ApiError ? post.error.fields.body : undefined;
  const send = (event: FormEvent) => {
    event.preventDefault();
    // After each send the switch goes back to internal, so the next note cannot reach the homeowner by a slip.
    post.mutate(office ? { body: text, visibility } : { body: text }, {
      onSuccess: () => {
        setText('');
        setVisibility('internal');
      },
    });
  };
  const sendLabel = !office
    ? post.isPending
      ? 'Sending…'
      : 'Send message'
    : visibility === 'internal'
      ? 'Save internal note'
      : 'Send to the homeowner';
  return (
    <form onSubmit={send} noValidate className="space-y-2" aria-label="Write a message">
      <label htmlFor={inputId} className="block text-sm font-semibold text-stone-800">
        {office ? 'Message' : writeLabel}
      </label>
      <TextArea
        id={inputId}
        rows={3}
        value={text}
        onChange={(e) => setText(e.target.value)}
        maxLength={4000}
        aria-invalid={Boolean(fieldError)}
        aria-describedby={fieldError ? `${inputId}-error` : undefined}
      />
      {fieldError && (
        <p id={`${inputId}-error`} className="text-sm font-medium text-clay">
          {fieldError}
        </p>
      )}
      {office && (
        <>
          <fieldset className="flex flex-wrap gap-4 text-sm">
            <legend className="sr-only">Who can read it</legend>
            <label className="flex items-center gap-2">
              <input
                type="radio"
                name={`${inputId}-visibility`}
                checked={visibility === 'internal'}
                onChange={() => setVisibility('internal')}
                className="accent-pine-700"
              />
              Internal note (office only)
            </label>
            <label className="flex items-center gap-2">
              <input
                type="radio"
                name={`${inputId}-visibility`}
                checked={visibility === 'shared'}
                onChange={() => setVisibility('shared')}
                className="accent-pine-700"
              />
              Shared with the homeowner
            </label>
          </fieldset>
          <p className="text-xs text-stone-600">
            {visibility === 'internal'
              ? 'Only the office sees internal notes; nobody is e-mailed.'
              : 'The homeowner, and the crew lead once a crew holds the job, get an e-mail with this message.'}
          </p>
        </>
      )}
      {post.error && !fieldError ? <ErrorNotice error={post.error} /> : null}
      <Button type="submit" disabled={post.isPending || text.trim() === ''}>
        {sendLabel}
      </Button>
    </form>
  );
}
