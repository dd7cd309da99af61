import type { ReactNode } from 'react';
import { StatusBadge } from '@/components/ui/status-badge';
import type { OfficeRequestView as OfficeRequest } from '@shared/contracts/requests';
import { formatDay } from '@shared/format/when';
import { AssignControl } from './assign-control';
import { SitePositionControl } from './site-position-form';
import { formatWhen, timeInStatus } from './time-in-status';

/** The few facts the office checks first, above the full application. */
export function RequestFacts({ request, meId }: { request: OfficeRequest; meId: string }) {
  const rows: [string, ReactNode][] = [
    [
      'Status',
      <span key="s" className="flex flex-wrap items-center gap-2">
        <StatusBadge status={request.status} />
        <span className="text-stone-600">for {timeInStatus(request.statusChangedAt)}</span>
      </span>,
    ],
    ['Homeowner', request.applicantName || '—'],
    ['Site', request.siteAddress || '—'],
    ['Road', request.roadName || '—'],
    ['Sent to the office', formatWhen(request.submittedAt)],
    ['Site visit', formatWhen(request.visitAt)],
    [
      'Site position',
      <SitePositionControl key="p" requestId={request.id} lat={request.siteLat} lng={request.siteLng} />,
    ],
    ['Crew lead', request.crewLeadName || '—'],
    ['Work day', request.workDay ? formatDay(request.workDay) : '—'],
    [
      'Permit',
      request.permitReference
        ? `${request.permitReference}${request.permitDecidedOn ? `, decided ${formatDay(request.permitDecidedOn)}` : ''}${request.permitExpiresOn ? `, expires ${formatDay(request.permitExpiresOn)}` : ''}`
        : '—',
    ],
    [
      'Assignee',
      <AssignControl key="a" requestId={request.id} assigneeId={request.assigneeId} meId={meId} label="Assignee" />,
    ],
  ];
  if (request.permitConditions) rows.splice(10, 0, ['Permit conditions', request.permitConditions]);
  return (
    <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-[12rem_1fr]">
      {rows.map(([label, value]) => (
        <div key={label} className="contents">
          <dt className="text-sm font-semibold text-stone-600">{label}</dt>
          <dd className="text-stone-900">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
