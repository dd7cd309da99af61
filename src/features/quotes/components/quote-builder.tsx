import { useState, type FormEvent } from 'react';
import {
  quoteLabels as L,
  quoteStatusLabels,
  type QuoteLineInput,
  type QuoteView,
  type UpdateQuoteInput,
} from '@shared/contracts/quotes';
import { quoteLineKinds, lineKindLabels, type QuoteLineKind } from '@shared/contracts/rate-cards';
import { formatDay } from '@shared/format/dates';
import { centsToDollarsText, formatCents, parseDollarsToCents, quoteTotals } from '@shared/money/money';
import { Button } from '@/components/ui/button';
import { Field, SelectInput, TextArea, TextInput } from '@/components/ui/field';
import { ErrorNotice, Loading, Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useCreateQuote } from '../api/create-quote';
import { useDiscardQuote } from '../api/discard-quote';
import { quotePdfHref, useQuotes } from '../api/get-quotes';
import { useSendQuote } from '../api/send-quote';
import { useUpdateQuote } from '../api/update-quote';
import { QuoteLinesTable } from './quote-lines-table';

interface LineRow {
  kind: QuoteLineKind;
  description: string;
  quantity: string;
  unit: string;
  unitPrice: string;
  taxable: boolean;
  source: string;
}
interface DraftForm {
  lines: LineRow[];
  terms: string;
  validUntil: string;
}

const toForm = (q: QuoteView): DraftForm => ({
  lines: q.lines.map((l) => ({
    kind: l.kind,
    description: l.description,
    quantity: String(l.quantity),
    unit: l.unit,
    unitPrice: centsToDollarsText(l.unitPriceCents),
    taxable: l.taxable,
    source: l.source,
  })),
  terms: q.terms,
  validUntil: q.validUntil,
});

const numberOf = (text: string) => (/^\s*-?\d+(\.\d+)?\s*$/.test(text) ? Number(text) : Number.NaN);

/** The form as the contract's input; a price that is not dollars and cents is named before anything is sent. */
function toInput(form: DraftForm): { input?: UpdateQuoteInput; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  const lines: QuoteLineInput[] = form.lines.map((row, i) => {
    const cents = parseDollarsToCents(row.unitPrice);
    if (cents === null)
      errors[`lines.${i}.unitPriceCents`] = `${L.unitPriceCents} must be dollars and cents, zero or more (like 18.50)`;
    return {
      kind: row.kind,
      description: row.description,
      quantity: numberOf(row.quantity),
      unit: row.unit,
      unitPriceCents: cents ?? 0,
      taxable: row.taxable,
      source: row.source,
    };
  });
  const input = { lines, terms: form.terms, validUntil: form.validUntil };
  return Object.keys(errors).length > 0 ? { errors } : { input, errors };
}

/** The running totals while the office types: the same integer arithmetic the server stores. */
function liveTotals(form: DraftForm, quote: QuoteView) {
  const lines = form.lines
    .map((r) => ({
      quantity: numberOf(r.quantity),
      unitPriceCents: parseDollarsToCents(r.unitPrice),
      taxable: r.taxable,
    }))
    .filter(
      (l): l is { quantity: number; unitPriceCents: number; taxable: boolean } =>
        Number.isFinite(l.quantity) && l.quantity >= 0 && l.quantity <= 100_000 && l.unitPriceCents !== null,
    );
  return quoteTotals(lines, quote.taxRateBp, quote.depositRateBp);
}

function DraftEditor({ quote, ownerName }: { quote: QuoteView; ownerName: string }) {
  const [form, setForm] = useState(() => toForm(quote));
  const [dirty, setDirty] = useState(false);
  const [localErrors, setLocalErrors] = useState<Record<string, string>>({});
  const [confirmSend, setConfirmSend] = useState(false);
  const update = useUpdateQuote(quote.requestId);
  const send = useSendQuote(quote.requestId);
  const discard = useDiscardQuote(quote.requestId);
  const serverErrors = update.error instanceof ApiError ? update.error.fields : {};
  const sendErrors = send.error instanceof ApiError ? send.error.fields : {};
  const err = (key: string) => localErrors[key] ?? serverErrors[key] ?? sendErrors[key];
  const change = (patch: Partial<DraftForm>) => {
    setForm((f) => ({ ...f, ...patch }));
    setDirty(true);
    setConfirmSend(false);
  };
  const setLine = (i: number, patch: Partial<LineRow>) =>
    change({ lines: form.lines.map((l, j) => (j === i ? { ...l, ...patch } : l)) });

  const save = async () => {
    const { input, errors } = toInput(form);
    setLocalErrors(errors);
    if (!input) return false;
    await update.mutateAsync({ quoteId: quote.id, input });
    setDirty(false);
    return true;
  };
  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    void save().catch(() => undefined);
  };
  const totals = liveTotals(form, quote);
  const anyErrors = Object.keys(localErrors).length + Object.keys(serverErrors).length > 0;

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <p className="text-sm text-stone-600">
        Draft version {quote.version}, from grade check {quote.gradeCheckNumber} and rate card version{' '}
        {quote.rateCardVersion}. The owner sees nothing until it is sent.
      </p>
      <ol className="space-y-3" aria-label="Quote lines">
        {form.lines.map((line, i) => (
          <li key={i} className="rounded border border-stone-200 p-3">
            <div className="grid gap-3 sm:grid-cols-[2fr_1fr_1fr_1fr]">
              <Field label={`${L.description} (line ${i + 1})`} error={err(`lines.${i}.description`)}>
                {(ids) => (
                  <TextInput
                    id={ids.id}
                    aria-describedby={ids.describedBy}
                    aria-invalid={ids.invalid}
                    value={line.description}
                    onChange={(e) => setLine(i, { description: e.target.value })}
                  />
                )}
              </Field>
              <Field label={`${L.quantity} (line ${i + 1})`} error={err(`lines.${i}.quantity`)}>
                {(ids) => (
                  <TextInput
                    id={ids.id}
                    aria-describedby={ids.describedBy}
                    aria-invalid={ids.invalid}
                    inputMode="decimal"
                    value={line.quantity}
                    onChange={(e) => setLine(i, { quantity: e.target.value })}
                  />
                )}
              </Field>
              <Field label={`${L.unit} (line ${i + 1})`} error={err(`lines.${i}.unit`)}>
                {(ids) => (
                  <TextInput
                    id={ids.id}
                    aria-describedby={ids.describedBy}
                    aria-invalid={ids.invalid}
                    value={line.unit}
                    onChange={(e) => setLine(i, { unit: e.target.value })}
                  />
                )}
              </Field>
              <Field label={`${L.unitPriceCents} $ (line ${i + 1})`} error={err(`lines.${i}.unitPriceCents`)}>
                {(ids) => (
                  <TextInput
                    id={ids.id}
                    aria-describedby={ids.describedBy}
                    aria-invalid={ids.invalid}
                    inputMode="decimal"
                    value={line.unitPrice}
                    onChange={(e) => setLine(i, { unitPrice: e.target.value })}
                  />
                )}
              </Field>
            </div>
            <div className="mt-2 flex flex-wrap items-center gap-4 text-sm">
              <label className="flex items-center gap-2">
                <input
                  type="checkbox"
                  checked={line.taxable}
                  onChange={(e) => setLine(i, { taxable: e.target.checked })}
                />
                {L.taxable}
              </label>
              <span className="text-stone-600">
                {lineKindLabels[line.kind]} · {L.source}: {line.source || 'added by the office'}
              </span>
              <Button variant="quiet" onClick={() => change({ lines: form.lines.filter((_, j) => j !== i) })}>
                Remove line {i + 1}
              </Button>
            </div>
          </li>
        ))}
      </ol>
      {err('lines') && <p className="text-sm font-medium text-clay">{err('lines')}</p>}
      <div className="flex flex-wrap items-end gap-3">
        <Field label="Kind of line to add">
          {(ids) => (
            <SelectInput id={ids.id} defaultValue="other" name="new-line-kind">
              {quoteLineKinds.map((k) => (
                <option key={k} value={k}>
                  {lineKindLabels[k]}
                </option>
              ))}
            </SelectInput>
          )}
        </Field>
        <Button
          variant="secondary"
          onClick={(e) => {
            const select = e.currentTarget.form?.elements.namedItem('new-line-kind') as HTMLSelectElement | null;
            const kind = (select?.value ?? 'other') as QuoteLineKind;
            change({
              lines: [
                ...form.lines,
                {
                  kind,
                  description: kind === 'other' ? '' : lineKindLabels[kind],
                  quantity: '1',
                  unit: 'each',
                  unitPrice: '0.00',
                  taxable: false,
                  source: '',
                },
              ],
            });
          }}
        >
          Add a line
        </Button>
      </div>
      <Field
        label={L.terms}
        hint="Payment, what the price leaves out, what happens if rock is found."
        error={err('terms')}
      >
        {(ids) => (
          <TextArea
            id={ids.id}
            aria-describedby={ids.describedBy}
            aria-invalid={ids.invalid}
            value={form.terms}
            onChange={(e) => change({ terms: e.target.value })}
          />
        )}
      </Field>
      <Field label={L.validUntil} error={err('validUntil')}>
        {(ids) => (
          <TextInput
            id={ids.id}
            type="date"
            aria-describedby={ids.describedBy}
            aria-invalid={ids.invalid}
            value={form.validUntil}
            onChange={(e) => change({ validUntil: e.target.value })}
          />
        )}
      </Field>
      <p className="text-sm" aria-live="polite">
        Total as typed: <strong>{formatCents(totals.totalCents)}</strong> (tax {formatCents(totals.taxCents)}, deposit{' '}
        {formatCents(totals.depositCents)})
      </p>
      {anyErrors && (
        <Notice tone="error" title="Some lines need fixing">
          Each box with a problem says what it needs.
        </Notice>
      )}
      {!(update.error instanceof ApiError && Object.keys(serverErrors).length > 0) && (
        <ErrorNotice error={update.error} />
      )}
      <ErrorNotice error={send.error ?? discard.error} />
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={update.isPending}>
          {update.isPending ? 'Saving…' : 'Save draft'}
        </Button>
        {dirty ? (
          <span className="text-sm text-stone-600">Save the draft to preview its PDF.</span>
        ) : (
          <a
            href={quotePdfHref(quote.id)}
            target="_blank"
            rel="noreferrer"
            className="text-sm font-semibold text-pine-700 hover:underline"
          >
            Preview the PDF
          </a>
        )}
        {update.isSuccess && !dirty && (
          <span role="status" className="text-sm text-pine-800">
            Draft saved.
          </span>
        )}
      </div>
      <div className="flex flex-wrap items-center gap-3 border-t border-stone-200 pt-3">
        {!confirmSend ? (
          <Button disabled={send.isPending} onClick={() => setConfirmSend(true)}>
            Send to the owner…
          </Button>
        ) : (
          <div
            role="group"
            aria-label="Confirm sending"
            className="flex flex-wrap items-center gap-2 rounded border border-tape bg-amber-50 p-3"
          >
            <span className="text-sm">
              Send version {quote.version} to {ownerName || 'the owner'}? A sent quote cannot be changed; a change later
              is a new version.
            </span>
            <Button
              disabled={send.isPending}
              onClick={() =>
                void (dirty ? save() : Promise.resolve(true))
                  .then((ok) => (ok ? send.mutateAsync(quote.id) : undefined))
                  .catch(() => undefined)
                  .finally(() => setConfirmSend(false))
              }
            >
              Yes, send version {quote.version}
            </Button>
            <Button variant="quiet" onClick={() => setConfirmSend(false)}>
              Cancel
            </Button>
          </div>
        )}
        <Button variant="quiet" disabled={discard.isPending} onClick={() => discard.mutate(quote.id)}>
          Discard this draft
        </Button>
      </div>
    </form>
  );
}

function SentVersion({ quote }: { quote: QuoteView }) {
  return (
    <details open={quote.current} className="rounded border border-stone-200 p-3">
      <summary className="cursor-pointer text-sm font-semibold">
        Version {quote.version}: {quoteStatusLabels[quote.status]}
        {quote.current ? ' (current)' : ''} · {formatCents(quote.totalCents)} · sent {formatDay(quote.sentAt)}
      </summary>
      <div className="mt-3 space-y-2">
        <QuoteLinesTable quote={quote} />
        <p className="text-sm text-stone-600">
          Valid until {formatDay(quote.validUntil)} · from grade check {quote.gradeCheckNumber}, rate card version{' '}
          {quote.rateCardVersion}
        </p>
        {quote.acceptedAt && (
          <p className="text-sm">
            Accepted {formatDay(quote.acceptedAt)} by typing “{quote.acceptedName}”.
          </p>
        )}
        {quote.declinedAt && (
          <p className="text-sm">
            Declined {formatDay(quote.declinedAt)}: “{quote.declineReason}”
          </p>
        )}
        <a
          href={quotePdfHref(quote.id)}
          target="_blank"
          rel="noreferrer"
          className="text-sm font-semibold text-pine-700 hover:underline"
        >
          Open the PDF of version {quote.version}
        </a>
      </div>
    </details>
  );
}

/** The office's quote for one request: draft from a check, edit, preview, send; sent versions stay as they were. */
export function QuoteBuilder({ requestId, ownerName }: { requestId: string; ownerName: string }) {
  const query = useQuotes(requestId);
  const create = useCreateQuote(requestId);
  if (query.isPending) return <Loading label="Loading the quote…" />;
  if (query.error) return <ErrorNotice error={query.error} />;
  const { quotes, latestCheck, rateCardPublished } = query.data;
  const draft = quotes.find((q) => q.status === 'draft');
  const current = quotes.find((q) => q.current);
  const accepted = quotes.some((q) => q.status === 'accepted');
  const sent = quotes.filter((q) => q.status !== 'draft');
  const newerCheck = latestCheck && current && latestCheck.id !== current.gradeCheckId;

  return (
    <div className="space-y-4">
      {!rateCardPublished && (
        <Notice tone="warn">No rate card is published yet: an admin sets the prices first.</Notice>
      )}
      {!latestCheck && <Notice>Save a grade check first: the quote is made from its quantities.</Notice>}
      {draft && <DraftEditor key={draft.id} quote={draft} ownerName={ownerName} />}
      {!draft && !accepted && latestCheck && rateCardPublished && (
        <div className="space-y-2">
          {newerCheck && (
            <Notice>
              Grade check {latestCheck.number} is newer than the one version {current.version} was made from: a revised
              quote would use its quantities.
            </Notice>
          )}
          <Button disabled={create.isPending} onClick={() => create.mutate({ gradeCheckId: latestCheck.id })}>
            {current
              ? `Make a revised quote from check ${latestCheck.number}`
              : `Make a quote from check ${latestCheck.number}`}
          </Button>
          <ErrorNotice error={create.error} />
        </div>
      )}
      {accepted && <Notice>The owner accepted a quote; it stands as sent.</Notice>}
      {sent.length > 0 && (
        <div className="space-y-2">
          <h3 className="font-bold text-pine-900">Sent versions</h3>
          {sent.map((q) => (
            <SentVersion key={q.id} quote={q} />
          ))}
        </div>
      )}
    </div>
  );
}
