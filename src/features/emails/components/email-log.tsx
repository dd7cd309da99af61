import { formatMoment } from '@shared/format/dates';
import { Fragment, useState, type FormEvent } from 'react';
import { Link } from 'react-router';
import { Button } from '@/components/ui/button';
import { ErrorNotice, Loading, Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { emailStatuses, useEmails, type EmailStatus } from '../api/get-emails';
import { EmailDetailPanel } from './email-detail';
import { EmailStatusBadge, emailStatusText } from './email-status';
import { ResendDead } from './resend-dead';
import { ScrollRegion } from '@/components/ui/scroll-region';

const when = (iso: string | null) => formatMoment(iso);

/** Everything Gradepass has sent or tried to send, newest first, filterable by status. */
export function EmailLog() {
  const [status, setStatus] = useState<EmailStatus | undefined>();
  const [search, setSearch] = useState('');
  const [applied, setApplied] = useState('');
  const [open, setOpen] = useState<string | null>(null);
  const log = useEmails({ status, search: applied || undefined });
  const totals = log.data?.pages[0]?.totals;
  const rows = log.data?.pages.flatMap((p) => p.emails) ?? [];
  const submit = (e: FormEvent) => {
    e.preventDefault();
    setApplied(search.trim());
  };

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex flex-wrap gap-1.5" role="group" aria-label="Status">
          {[undefined, ...emailStatuses].map((s) => (
            <button
              key={s ?? 'all'}
              type="button"
              aria-pressed={status === s}
              onClick={() => setStatus(s)}
              className={`rounded-full border px-3 py-1 text-xs font-semibold ${status === s ? 'border-pine-700 bg-pine-700 text-white' : 'border-stone-300 bg-white text-stone-700'}`}
            >
              {s ? emailStatusText[s] : 'All'}
              {s && totals ? ` (${totals[s]})` : ''}
            </button>
          ))}
        </div>
        <form role="search" onSubmit={submit} className="flex gap-2">
          <input
            type="search"
            aria-label="Search e-mails"
            placeholder="Address, subject or reference"
            value={search}
            onChange={(e) => setSearch(e.target.value)}
            className="rounded-md border border-stone-300 px-2 py-1.5 text-sm"
          />
          <Button type="submit" variant="secondary">
            Search
          </Button>
        </form>
      </div>
      <ResendDead deadCount={totals?.dead ?? 0} />
      {log.error && <ErrorNotice error={log.error} />}
      {log.isPending && <Loading label="Loading the e-mail log…" />}
      {log.data && rows.length === 0 && <Notice title="No e-mails here yet" />}
      {rows.length > 0 && (
        <ScrollRegion label="E-mail log" className="rounded-lg border border-stone-200 bg-white">
          <table className="w-full min-w-[48rem] text-left text-sm">
            <thead className="bg-pine-50 text-xs uppercase tracking-wide text-pine-900">
              <tr>
                <th className="px-3 py-2">Written</th>
                <th className="px-3 py-2">To</th>
                <th className="px-3 py-2">Subject</th>
                <th className="px-3 py-2">Request</th>
                <th className="px-3 py-2">Status</th>
                <th className="px-3 py-2">Sent</th>
              </tr>
            </thead>
            <tbody>
              {rows.map((e) => (
                <Fragment key={e.id}>
                  <tr className="border-t border-stone-100 align-top">
                    <td className="px-3 py-2 whitespace-nowrap">{when(e.createdAt)}</td>
                    <td className="px-3 py-2">{e.toAddress}</td>
                    <td className="px-3 py-2">
                      <button
                        type="button"
                        className="text-left font-semibold text-pine-700 hover:underline"
                        aria-expanded={open === e.id}
                        onClick={() => setOpen(open === e.id ? null : e.id)}
                      >
                        {e.subject}
                      </button>
                      {e.lastError && e.status !== 'sent' && (
                        <p className="mt-1 line-clamp-2 text-xs text-clay">{e.lastError}</p>
                      )}
                    </td>
                    <td className="px-3 py-2">
                      {e.requestId ? (
                        <Link
                          className="font-mono text-pine-700 hover:underline"
                          to={paths.office.request.getHref(e.requestId)}
                        >
                          {e.reference}
                        </Link>
                      ) : (
                        '—'
                      )}
                    </td>
                    <td className="px-3 py-2">
                      <EmailStatusBadge email={e} />
                    </td>
                    <td className="px-3 py-2 whitespace-nowrap">{when(e.sentAt)}</td>
                  </tr>
                  {open === e.id && (
                    <tr>
                      <td colSpan={6} className="bg-paper px-3 py-3">
                        <EmailDetailPanel id={e.id} />
                      </td>
                    </tr>
                  )}
                </Fragment>
              ))}
            </tbody>
          </table>
        </ScrollRegion>
      )}
      {log.hasNextPage && (
        <Button variant="secondary" onClick={() => log.fetchNextPage()} disabled={log.isFetchingNextPage}>
          Show older e-mails
        </Button>
      )}
    </div>
  );
}
