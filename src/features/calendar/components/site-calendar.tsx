import { useState } from 'react';
import { Link } from 'react-router';
import type { CalendarEntry } from '@shared/contracts/calendar';
import { formatDay, formatTime } from '@shared/format/when';
import { Button } from '@/components/ui/button';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { useCalendar } from '../api/get-calendar';

type Span = 'month' | 'week';

/** A day as YYYY-MM-DD in the reader's own time zone. */
const isoDay = (d: Date) =>
  `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
const addDays = (d: Date, n: number) => new Date(d.getFullYear(), d.getMonth(), d.getDate() + n);
/** Weeks start on Monday, as a work week does. */
const mondayOf = (d: Date) => addDays(d, -((d.getDay() + 6) % 7));

function shownDays(anchor: Date, span: Span): Date[] {
  if (span === 'week') {
    const start = mondayOf(anchor);
    return Array.from({ length: 7 }, (_, i) => addDays(start, i));
  }
  const first = new Date(anchor.getFullYear(), anchor.getMonth(), 1);
  const last = new Date(anchor.getFullYear(), anchor.getMonth() + 1, 0);
  const start = mondayOf(first);
  const count = Math.ceil(((last.getTime() - start.getTime()) / 86_400_000 + 1) / 7) * 7;
  return Array.from({ length: count }, (_, i) => addDays(start, i));
}

const weekdays = ['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun'];

function EntryLine({ entry, hrefFor }: { entry: CalendarEntry; hrefFor: (id: string) => string }) {
  const visit = entry.kind === 'visit';
  return (
    <li
      className={`rounded border-l-4 px-2 py-1 text-xs ${visit ? 'border-pine-600 bg-pine-50' : 'border-tape bg-amber-50'}`}
    >
      <Link to={hrefFor(entry.requestId)} className="font-semibold text-stone-900 underline-offset-2 hover:underline">
        {visit ? `Site visit ${formatTime(entry.at)}` : 'Crew work day'} ·{' '}
        <span className="font-mono">{entry.reference}</span>
      </Link>
      <span className="block text-stone-700">{entry.siteAddress || entry.applicantName}</span>
      <span className="block text-stone-600">
        {visit
          ? `Office: ${entry.assigneeName ?? 'nobody assigned'}`
          : `Crew lead: ${entry.crewLeadName ?? 'not known'}`}
      </span>
    </li>
  );
}

/** Booked site visits and the crews' work days, by month or by week; every entry opens its request. */
export function SiteCalendar({ hrefFor, today = new Date() }: { hrefFor: (id: string) => string; today?: Date }) {
  const [span, setSpan] = useState<Span>('month');
  const [anchor, setAnchor] = useState(today);
  const days = shownDays(anchor, span);
  const from = isoDay(days[0]);
  const to = isoDay(days[days.length - 1]);
  const calendar = useCalendar(from, to);
  const byDay = new Map<string, CalendarEntry[]>();
  for (const entry of calendar.data?.entries ?? []) {
    const key = entry.kind === 'visit' ? isoDay(new Date(entry.at)) : entry.day;
    byDay.set(key, [...(byDay.get(key) ?? []), entry]);
  }
  const move = (n: number) =>
    setAnchor((a) =>
      span === 'week' ? addDays(a, 7 * n) : new Date(a.getFullYear(), a.getMonth() + n, Math.min(a.getDate(), 28)),
    );
  const title =
    span === 'month'
      ? anchor.toLocaleDateString('en-US', { month: 'long', year: 'numeric' })
      : `Week of ${formatDay(days[0])}`;
  const todayKey = isoDay(today);
  const count = calendar.data?.entries.length ?? 0;

  return (
    <section aria-labelledby="calendar-title" className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="calendar-title" className="text-xl font-bold text-pine-900" aria-live="polite">
          {title}
        </h2>
        <div className="flex flex-wrap gap-2" role="group" aria-label="Move through the calendar">
          <Button variant="secondary" onClick={() => move(-1)}>
            {span === 'month' ? 'Previous month' : 'Previous week'}
          </Button>
          <Button variant="secondary" onClick={() => setAnchor(today)}>
            Today
          </Button>
          <Button variant="secondary" onClick={() => move(1)}>
            {span === 'month' ? 'Next month' : 'Next week'}
          </Button>
        </div>
        <div className="flex gap-2" role="group" aria-label="How much to show">
          {(['month', 'week'] as const).map((s) => (
            <Button
              key={s}
              variant={span === s ? 'primary' : 'secondary'}
              aria-pressed={span === s}
              onClick={() => setSpan(s)}
            >
              {s === 'month' ? 'Month' : 'Week'}
            </Button>
          ))}
        </div>
      </div>
      <p className="text-sm text-stone-600">
        <span className="mr-3 inline-block border-l-4 border-pine-600 pl-1">Site visits booked by the office</span>
        <span className="inline-block border-l-4 border-tape pl-1">Work days the crews have planned</span>
        {calendar.isFetching
          ? ' · Loading…'
          : ` · ${count === 0 ? 'Nothing booked in these days' : `${count} in these days`}`}
      </p>
      {calendar.isPending && <Loading />}
      <ErrorNotice error={calendar.error} />
      <div
        className="hidden grid-cols-7 gap-1 text-center text-xs font-semibold uppercase text-stone-600 sm:grid"
        aria-hidden
      >
        {weekdays.map((w) => (
          <span key={w}>{w}</span>
        ))}
      </div>
      <ol className="grid grid-cols-1 gap-1 sm:grid-cols-7" aria-label={title}>
        {days.map((d) => {
          const key = isoDay(d);
          const entries = byDay.get(key) ?? [];
          const outside = span === 'month' && d.getMonth() !== anchor.getMonth();
          // A phone shows only the days with something on them, as a list.
          const emptyOnPhone = entries.length === 0 ? 'hidden sm:block' : '';
          return (
            <li
              key={key}
              aria-label={`${d.toLocaleDateString('en-US', { weekday: 'long' })} ${formatDay(d)}${entries.length ? `, ${entries.length} booked` : ''}`}
              className={`${emptyOnPhone} min-h-20 rounded border p-1 ${key === todayKey ? 'border-pine-600 border-2' : 'border-stone-200'} ${outside ? 'bg-stone-50 text-stone-600' : 'bg-white'}`}
            >
              <p className="text-xs font-semibold">
                <span className="sm:hidden">{d.toLocaleDateString('en-US', { weekday: 'short' })} </span>
                {d.getDate()}
                {key === todayKey && <span className="ml-1 text-pine-700">today</span>}
              </p>
              {entries.length > 0 && (
                <ul className="mt-1 space-y-1">
                  {entries.map((e) => (
                    <EntryLine key={`${e.kind}-${e.requestId}`} entry={e} hrefFor={hrefFor} />
                  ))}
                </ul>
              )}
            </li>
          );
        })}
      </ol>
    </section>
  );
}
