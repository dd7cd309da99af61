import { useEffect, useId, useRef, useState, type FormEvent } from 'react';
import { Link } from 'react-router';
import { Button } from '@/components/ui/button';
import { TextArea } from '@/components/ui/field';
import { ErrorNotice, Notice } from '@/components/ui/notice';
import { StatusBadge } from '@/components/ui/status-badge';
import { ApiError } from '@/lib/api-client';
import { useRunTransition } from '@/lib/status-change';
import type { RequestView } from '@shared/contracts/requests';
import { formatDay, formatTime } from '@shared/format/when';

/** Where the request stands in plain words, and the applicant's own moves from here. */
interface RequestStatusProps {
  request: RequestView;
  editHref: string;
  /** The office's latest question, when it has asked for details. */
  question?: string;
}

export function RequestStatus({ request, editHref, question }: RequestStatusProps) {
  const transition = useRunTransition(request.id);
  const can = (action: string) => request.actions.some((a) => a.action === action);
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center gap-3">
        <StatusBadge status={request.status} />
        <p className="text-stone-700">{request.whatNext}</p>
      </div>
      <Dates request={request} />
      {request.status === 'draft' && (
        <Link
          to={editHref}
          className="inline-flex rounded-md bg-pine-700 px-4 py-2 text-sm font-semibold text-white hover:bg-pine-800"
        >
          Continue the form
        </Link>
      )}
      {request.status === 'needs_details' && <AnswerForm request={request} editHref={editHref} question={question} />}
      {can('withdraw') && (
        <Withdraw
          onConfirm={() => transition.mutate({ action: 'withdraw', expectedVersion: request.version })}
          pending={transition.isPending}
        />
      )}
      <ErrorNotice error={transition.error} />
    </div>
  );
}

/** When someone comes to the site: the office's visit while it is booked, and the crew's work day once set. */
function Dates({ request }: { request: RequestView }) {
  const visit = request.status === 'visit_booked' && request.visitAt ? request.visitAt : null;
  const workDay = request.workDay && ['crew_assigned', 'under_construction'].includes(request.status);
  if (!visit && !workDay) return null;
  return (
    <dl className="grid gap-x-4 gap-y-1 rounded-md border border-pine-200 bg-pine-50 p-3 sm:grid-cols-[10rem_1fr]">
      {visit && (
        <>
          <dt className="font-semibold text-pine-900">Site visit</dt>
          <dd>
            {formatDay(visit)} at {formatTime(visit)}
            <span className="block text-sm text-stone-600">
              The office measures the road edge and the ground; you need not be home. The e-mail has a calendar
              invitation.
            </span>
          </dd>
        </>
      )}
      {workDay && request.workDay && (
        <>
          <dt className="font-semibold text-pine-900">Crew’s work day</dt>
          <dd>
            {formatDay(request.workDay)}
            <span className="block text-sm text-stone-600">Please keep the entrance area clear of vehicles.</span>
          </dd>
        </>
      )}
    </dl>
  );
}

function AnswerForm({ request, editHref, question }: RequestStatusProps) {
  const id = useId();
  const transition = useRunTransition(request.id);
  const [answer, setAnswer] = useState('');
  const fieldError = transition.error instanceof ApiError ? transition.error.fields.answer : undefined;
  const send = (event: FormEvent) => {
    event.preventDefault();
    transition.mutate({ action: 'answer', expectedVersion: request.version, answer });
  };
  return (
    <form onSubmit={send} noValidate className="space-y-2 rounded-md border-l-4 border-tape bg-amber-50 p-4">
      <p className="font-semibold text-amber-950">The office asks:</p>
      <p className="whitespace-pre-line">{question || 'See the latest message from the office.'}</p>
      <label htmlFor={id} className="block text-sm font-semibold">
        Your answer
      </label>
      <TextArea
        id={id}
        value={answer}
        onChange={(e) => setAnswer(e.target.value)}
        aria-invalid={Boolean(fieldError)}
        aria-describedby={fieldError ? `${id}-error` : undefined}
      />
      {fieldError && (
        <p id={`${id}-error`} className="text-sm font-medium text-clay">
          {fieldError}
        </p>
      )}
      <p className="text-sm text-stone-600">
        If the question is about your answers, you can also{' '}
        <Link className="underline" to={editHref}>
          change the form
        </Link>{' '}
        first.
      </p>
      <Button type="submit" disabled={transition.isPending}>
        {transition.isPending ? 'Sending…' : 'Send my answer'}
      </Button>
      {transition.error && !fieldError ? <ErrorNotice error={transition.error} /> : null}
    </form>
  );
}

function Withdraw({ onConfirm, pending }: { onConfirm: () => void; pending: boolean }) {
  const [asking, setAsking] = useState(false);
  const confirm = useRef<HTMLButtonElement>(null);
  // The question takes focus when it appears, so a keyboard user answers it next.
  useEffect(() => {
    if (asking) confirm.current?.focus();
  }, [asking]);
  if (!asking)
    return (
      <Button variant="secondary" onClick={() => setAsking(true)}>
        Withdraw this request
      </Button>
    );
  return (
    <Notice tone="warn" title="Withdraw this request?">
      <p>The office stops work on it. This cannot be undone; you would need to start a new request.</p>
      <div className="mt-2 flex gap-2">
        <Button variant="danger" onClick={onConfirm} disabled={pending} ref={confirm}>
          Yes, withdraw
        </Button>
        <Button variant="secondary" onClick={() => setAsking(false)}>
          Keep it
        </Button>
      </div>
    </Notice>
  );
}
