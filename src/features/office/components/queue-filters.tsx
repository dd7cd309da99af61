import { useState, type FormEvent } from 'react';
import { requestStatuses, statusText, type RequestStatus } from '@shared/workflow/statuses';
import { Button } from '@/components/ui/button';
import { useQueueOptions } from '../api/get-queue-options';
import type { QueueFilters, QueueSort } from '../api/types';

// Every status but a draft, which the office never sees.
const officeStatuses = requestStatuses.filter((status) => status !== 'draft');

// On a phone the table's sortable headers give way to cards, so the order is chosen here instead.
const sortChoices: [string, string][] = [
  ['waiting:asc', 'Longest in status first'],
  ['waiting:desc', 'Newest in status first'],
  ['reference:asc', 'Reference'],
  ['applicant:asc', 'Homeowner A–Z'],
  ['road:asc', 'Road A–Z'],
  ['created:desc', 'Newest requests first'],
];

const select = 'rounded-md border border-stone-300 bg-white px-2 py-1.5 text-sm';

export function QueueFilterBar({
  filters,
  onChange,
}: {
  filters: QueueFilters;
  onChange: (change: Partial<QueueFilters>) => void;
}) {
  const options = useQueueOptions().data;
  const [search, setSearch] = useState(filters.q);
  // The box follows the address bar (back, forward, a shared link) while keeping what is being typed otherwise.
  const [shownQ, setShownQ] = useState(filters.q);
  if (filters.q !== shownQ) {
    setShownQ(filters.q);
    setSearch(filters.q);
  }
  const submit = (e: FormEvent) => {
    e.preventDefault();
    onChange({ q: search.trim() });
  };
  const toggle = (status: RequestStatus) =>
    onChange({
      status: filters.status.includes(status)
        ? filters.status.filter((s) => s !== status)
        : [...filters.status, status],
    });

  return (
    <div className="space-y-3">
      <form role="search" onSubmit={submit} className="flex flex-wrap items-end gap-3">
        <label className="flex min-w-64 flex-1 flex-col gap-1 text-sm font-semibold text-stone-800">
          Search
          <input
            type="search"
            value={search}
            onChange={(e) => setSearch(e.target.value)}
            placeholder="Reference, name, address or road"
            className={`${select} font-normal`}
          />
        </label>
        <Button type="submit" variant="secondary">
          Search
        </Button>
        <label className="flex flex-col gap-1 text-sm font-semibold text-stone-800">
          Road authority
          <select
            className={select}
            value={filters.jurisdiction}
            onChange={(e) => onChange({ jurisdiction: e.target.value })}
          >
            <option value="">Any</option>
            <option value="none">Not matched yet</option>
            {options?.jurisdictions.map((j) => (
              <option key={j.id} value={j.id}>
                {j.name}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-sm font-semibold text-stone-800">
          Assigned to
          <select className={select} value={filters.assignee} onChange={(e) => onChange({ assignee: e.target.value })}>
            <option value="">Anyone</option>
            <option value="me">Me</option>
            <option value="none">Nobody</option>
            {options?.people.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-sm font-semibold text-stone-800 md:hidden">
          Order
          <select
            className={select}
            value={`${filters.sort}:${filters.dir}`}
            onChange={(e) => {
              const [sort, dir] = e.target.value.split(':');
              onChange({ sort: sort as QueueSort, dir: dir as 'asc' | 'desc' });
            }}
          >
            {sortChoices.map(([value, label]) => (
              <option key={value} value={value}>
                {label}
              </option>
            ))}
          </select>
        </label>
        <label className="flex items-center gap-2 pb-1.5 text-sm font-semibold text-stone-800">
          <input
            type="checkbox"
            checked={filters.waiting}
            onChange={(e) => onChange({ waiting: e.target.checked })}
            className="size-4 accent-pine-700"
          />
          Waiting on us
        </label>
      </form>
      <fieldset className="flex flex-wrap gap-1.5">
        <legend className="mb-1 text-sm font-semibold text-stone-800">Status</legend>
        {officeStatuses.map((status) => {
          const on = filters.status.includes(status);
          return (
            <button
              key={status}
              type="button"
              aria-pressed={on}
              onClick={() => toggle(status)}
              className={`rounded-full border px-3 py-1 text-xs font-semibold ${on ? 'border-pine-700 bg-pine-700 text-white' : 'border-stone-300 bg-white text-stone-700 hover:border-pine-500'}`}
            >
              {statusText[status].label}
            </button>
          );
        })}
        {filters.status.length > 0 && (
          <button
            type="button"
            className="px-2 text-xs font-semibold text-pine-700 underline"
            onClick={() => onChange({ status: [] })}
          >
            Any status
          </button>
        )}
      </fieldset>
    </div>
  );
}
