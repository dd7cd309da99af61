import { formatMoment } from '@shared/format/dates';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table';
import { useMemo } from 'react';
import { Link } from 'react-router';
import { StatusBadge } from '@/components/ui/status-badge';
import { paths } from '@/config/paths';
import type { QueueFilters, QueueRow, QueueSort } from '../api/types';
import { AssignControl } from './assign-control';
import { timeInStatus } from './time-in-status';
import { ScrollRegion } from '@/components/ui/scroll-region';

const column = createColumnHelper<QueueRow>();

/** Table columns that the server can sort, by the sort name the API knows them by. */
const sortable: Record<string, QueueSort> = {
  reference: 'reference',
  applicant: 'applicant',
  road: 'road',
  waiting: 'waiting',
};

interface QueueTableProps {
  rows: QueueRow[];
  filters: QueueFilters;
  meId: string;
  onSort: (sort: QueueSort, dir: 'asc' | 'desc') => void;
}

/** Sorting and paging happen on the server; the table only shows the page and asks for another order. */
export function QueueTable({ rows, filters, meId, onSort }: QueueTableProps) {
  const columns = useMemo(
    () => [
      column.accessor('reference', {
        id: 'reference',
        header: 'Reference',
        cell: (c) => (
          <Link
            to={paths.office.request.getHref(c.row.original.id)}
            className="font-mono font-semibold text-pine-700 hover:underline"
          >
            {c.getValue()}
          </Link>
        ),
      }),
      column.accessor('applicantName', { id: 'applicant', header: 'Homeowner', cell: (c) => c.getValue() || '—' }),
      column.accessor('roadName', {
        id: 'road',
        header: 'Road and authority',
        cell: (c) => (
          <div>
            <div>{c.getValue() || '—'}</div>
            <div className="text-xs text-stone-600">
              {c.row.original.jurisdiction?.name ?? 'Authority not matched yet'}
            </div>
          </div>
        ),
      }),
      column.accessor('status', {
        id: 'status',
        header: 'Status',
        enableSorting: false,
        cell: (c) => <StatusBadge status={c.getValue()} />,
      }),
      column.accessor('statusChangedAt', {
        id: 'waiting',
        header: 'Time in status',
        cell: (c) => (
          <time dateTime={c.getValue()} title={formatMoment(c.getValue())}>
            {timeInStatus(c.getValue())}
          </time>
        ),
      }),
      column.display({
        id: 'assignee',
        header: 'Assignee',
        cell: (c) => (
          <AssignControl
            requestId={c.row.original.id}
            assigneeId={c.row.original.assignee?.id ?? null}
            meId={meId}
            label={`Assignee for ${c.row.original.reference}`}
          />
        ),
      }),
      column.accessor('nextAction', {
        id: 'next',
        header: 'Next action',
        enableSorting: false,
        cell: (c) => (
          <span className={c.row.original.waitingOnUs ? 'font-semibold text-pine-900' : 'text-stone-600'}>
            {c.getValue()}
          </span>
        ),
      }),
    ],
    [meId],
  );

  const sorting: SortingState = [{ id: filters.sort, desc: filters.dir === 'desc' }];
  const table = useReactTable({
    data: rows,
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    state: { sorting },
    getRowId: (row) => row.id,
  });

  return (
    <ScrollRegion label="Queue" className="rounded-lg border border-stone-200 bg-white">
      <table className="w-full min-w-[56rem] text-left text-sm">
        <thead className="bg-pine-50 text-xs uppercase tracking-wide text-pine-900">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sortName = sortable[header.column.id];
                const active = filters.sort === sortName;
                const label = flexRender(header.column.columnDef.header, header.getContext());
                return (
                  <th
                    key={header.id}
                    scope="col"
                    className="px-3 py-2"
                    aria-sort={active ? (filters.dir === 'asc' ? 'ascending' : 'descending') : undefined}
                  >
                    {sortName ? (
                      <button
                        type="button"
                        className="inline-flex items-center gap-1 uppercase hover:underline"
                        onClick={() => onSort(sortName, active && filters.dir === 'asc' ? 'desc' : 'asc')}
                      >
                        {label}
                        <span aria-hidden="true">{active ? (filters.dir === 'asc' ? '▲' : '▼') : '↕'}</span>
                      </button>
                    ) : (
                      label
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-t border-stone-100 align-top hover:bg-paper">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-3 py-2">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
