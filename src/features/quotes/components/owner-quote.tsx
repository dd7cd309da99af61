import { useState, type FormEvent } from 'react';
import { quoteLabels as L, quoteStatusLabels, type QuoteView } from '@shared/contracts/quotes';
import { formatDay, formatMoment } from '@shared/format/dates';
import { formatCents } from '@shared/money/money';
import { Button } from '@/components/ui/button';
import { Field, TextArea, TextInput } from '@/components/ui/field';
import { ErrorNotice, Loading, Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useAnswerQuote } from '../api/answer-quote';
import { quotePdfHref, useQuotes } from '../api/get-quotes';
import { QuoteLinesTable } from './quote-lines-table';

function Answer({
  quote,
  nameOnRequest,
  questionHref,
}: {
  quote: QuoteView;
  nameOnRequest: string;
  questionHref: string;
}) {
  const [name, setName] = useState('');
  const [declining, setDeclining] = useState(false);
  const [reason, setReason] = useState('');
  const answer = useAnswerQuote(quote.requestId);
  const fields = answer.error instanceof ApiError ? answer.error.fields : {};
  const accept = (e: FormEvent) => {
    e.preventDefault();
    answer.mutate({ quoteId: quote.id, accept: { name } });
  };
  const decline = (e: FormEvent) => {
    e.preventDefault();
    answer.mutate({ quoteId: quote.id, decline: { reason } });
  };
  return (
    <div className="space-y-4 border-t border-stone-200 pt-4">
      <form onSubmit={accept} noValidate className="space-y-2">
        <Field
          label={L.name}
          hint={`To accept version ${quote.version}, type your full name as it is on the request (${nameOnRequest}). It is kept with the date and the version you accepted.`}
          error={fields.name}
        >
          {(ids) => (
            <TextInput
              id={ids.id}
              aria-describedby={ids.describedBy}
              aria-invalid={ids.invalid}
              autoComplete="name"
              value={name}
              onChange={(e) => setName(e.target.value)}
            />
          )}
        </Field>
        <Button type="submit" disabled={answer.isPending}>
          Accept version {quote.version} ({formatCents(quote.totalCents)})
        </Button>
      </form>
      {!declining ? (
        <div className="flex flex-wrap gap-3 text-sm">
          <Button variant="secondary" onClick={() => setDeclining(true)}>
            Decline…
          </Button>
          <a href={questionHref} className="self-center font-semibold text-pine-700 hover:underline">
            Ask the office a question about it
          </a>
        </div>
      ) : (
        <form onSubmit={decline} noValidate className="space-y-2">
          <Field
            label={L.reason}
            hint="Say why, so the office can answer or offer another version."
            error={fields.reason}
          >
            {(ids) => (
              <TextArea
                id={ids.id}
                aria-describedby={ids.describedBy}
                aria-invalid={ids.invalid}
                value={reason}
                onChange={(e) => setReason(e.target.value)}
              />
            )}
          </Field>
          <div className="flex gap-3">
            <Button type="submit" variant="danger" disabled={answer.isPending}>
              Decline version {quote.version}
            </Button>
            <Button variant="quiet" onClick={() => setDeclining(false)}>
              Cancel
            </Button>
          </div>
        </form>
      )}
      {Object.keys(fields).length === 0 && <ErrorNotice error={answer.error} />}
    </div>
  );
}

/** The owner's view of the quote: the current version in full, older ones marked replaced, and the three answers. */
export function OwnerQuote({
  requestId,
  nameOnRequest,
  questionHref,
}: {
  requestId: string;
  nameOnRequest: string;
  questionHref: string;
}) {
  const query = useQuotes(requestId);
  if (query.isPending) return <Loading label="Loading the quote…" />;
  if (query.error) return <ErrorNotice error={query.error} />;
  const { quotes } = query.data;
  const current = quotes.find((q) => q.current);
  if (!current)
    return (
      <p className="text-sm text-stone-600">No quote yet: the office sends one after the site visit and grade check.</p>
    );
  const older = quotes.filter((q) => q.id !== current.id);
  const expired = current.validUntil < new Date().toISOString().slice(0, 10);
  return (
    <div className="space-y-4">
      <p className="text-sm">
        <strong>Version {current.version}</strong> · {quoteStatusLabels[current.status]} · sent{' '}
        {formatDay(current.sentAt)} · valid until {formatDay(current.validUntil)}
      </p>
      <QuoteLinesTable quote={current} />
      <p className="text-sm">
        Balance when the entrance is built: {formatCents(current.totalCents - current.depositCents)}.
      </p>
      {current.terms && (
        <div>
          <h3 className="text-sm font-semibold text-stone-800">{L.terms}</h3>
          <p className="whitespace-pre-line text-sm text-stone-700">{current.terms}</p>
        </div>
      )}
      <a
        href={quotePdfHref(current.id)}
        target="_blank"
        rel="noreferrer"
        className="text-sm font-semibold text-pine-700 hover:underline"
      >
        Open the quote as a PDF
      </a>
      {current.status === 'accepted' && (
        <Notice title={`You accepted version ${current.version}`}>
          On {formatMoment(current.acceptedAt)}, typing “{current.acceptedName}”.
        </Notice>
      )}
      {current.status === 'declined' && (
        <Notice title={`You declined version ${current.version}`}>Your reason: “{current.declineReason}”</Notice>
      )}
      {current.status === 'sent' && expired && (
        <Notice tone="warn">This quote is past its date; ask the office in the messages for a new one.</Notice>
      )}
      {current.status === 'sent' && !expired && (
        <Answer quote={current} nameOnRequest={nameOnRequest} questionHref={questionHref} />
      )}
      {older.length > 0 && (
        <ul className="space-y-1 text-sm text-stone-600" aria-label="Earlier versions">
          {older.map((q) => (
            <li key={q.id}>
              Version {q.version}: {quoteStatusLabels[q.status]} ({formatCents(q.totalCents)}) ·{' '}
              <a href={quotePdfHref(q.id)} target="_blank" rel="noreferrer" className="text-pine-700 hover:underline">
                PDF
              </a>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
