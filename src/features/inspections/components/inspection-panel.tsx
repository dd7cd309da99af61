import { inspectorLinkStateLabels } from '@shared/contracts/inspections';
import { formatDay } from '@shared/format/dates';
import type { RequestStatus } from '@shared/workflow/statuses';
import { Button } from '@/components/ui/button';
import { ErrorNotice, Loading, Notice } from '@/components/ui/notice';
import { useInspections } from '../api/get-inspections';
import { useRevokeInspectorLink } from '../api/revoke-inspector-link';
import { InspectionList } from './inspection-list';
import { SendLinkForm } from './send-link-form';

interface InspectionPanelProps {
  requestId: string;
  status: RequestStatus;
  /** The office sends and withdraws links; others read the outcomes. */
  office?: boolean;
}

/** The road authority's inspection of the built entrance: the outcomes, and for the office the inspector's links. */
export function InspectionPanel({ requestId, status, office = false }: InspectionPanelProps) {
  const { data, error, isPending } = useInspections(requestId);
  const revoke = useRevokeInspectorLink(requestId);
  if (isPending) return <Loading label="Loading inspections…" />;
  if (error) return <ErrorNotice error={error} />;
  const lastPassed = data.inspections[0]?.passed === true;
  return (
    <div className="space-y-4">
      {data.inspectionRequired && (
        <Notice tone={lastPassed ? 'info' : 'warn'}>
          {lastPassed
            ? 'The road authority’s rules ask for a passed inspection before closing: it has passed.'
            : 'The road authority’s rules ask for a passed inspection before the request can be closed.'}
        </Notice>
      )}
      <InspectionList inspections={data.inspections} />
      {office && (
        <>
          {status === 'built' ? (
            <div className="space-y-2 border-t border-stone-200 pt-4">
              <h3 className="font-bold text-pine-900">Send the inspector a link</h3>
              <p className="text-sm text-stone-600">
                The inspector opens a read-only page for this entrance only (the permit, the readings, the crew’s
                photos) and records the outcome there. No account is needed.
              </p>
              <SendLinkForm requestId={requestId} />
            </div>
          ) : (
            <p className="text-sm text-stone-600">A link can be sent once the crew has marked the job built.</p>
          )}
          {data.links && data.links.length > 0 && (
            <div className="space-y-2 border-t border-stone-200 pt-4">
              <h3 className="font-bold text-pine-900">Links sent</h3>
              <ul className="space-y-2 text-sm">
                {data.links.map((link) => (
                  <li key={link.id} className="flex flex-wrap items-center justify-between gap-2">
                    <span className="min-w-0 break-words">
                      {link.inspectorName} ({link.inspectorEmail}) · sent {formatDay(link.createdAt)} · until{' '}
                      {formatDay(link.expiresAt)} · <strong>{inspectorLinkStateLabels[link.state]}</strong>
                      {link.lastOpenedAt ? ` · last opened ${formatDay(link.lastOpenedAt)}` : ' · not opened yet'}
                    </span>
                    {link.state === 'open' && (
                      <Button variant="secondary" disabled={revoke.isPending} onClick={() => revoke.mutate(link.id)}>
                        Withdraw link
                      </Button>
                    )}
                  </li>
                ))}
              </ul>
              <ErrorNotice error={revoke.error} />
            </div>
          )}
        </>
      )}
    </div>
  );
}
