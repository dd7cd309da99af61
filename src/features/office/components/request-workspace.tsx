import type { ReactNode } from 'react';
import { Link, useSearchParams } from 'react-router';
import type { Role } from '@shared/workflow/statuses';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { PageHeader, Panel } from '@/components/ui/panel';
import { paths } from '@/config/paths';
import { useOfficeRequest } from '../api/get-office-request';
import type { OfficeRequest } from '../api/types';
import { ActionPanel, type Cautions } from './action-panel';
import { HistoryList } from './history-list';
import { MessageThread } from './message-thread';
import { PhotoViewer } from './photo-viewer';
import { RequestFacts } from './request-facts';

const tabs = [
  { id: 'overview', label: 'Overview' },
  { id: 'photos', label: 'Photos' },
  { id: 'messages', label: 'Messages' },
  { id: 'history', label: 'History' },
] as const;
type Tab = (typeof tabs)[number]['id'];

interface WorkspaceProps {
  requestId: string;
  me: { id: string; role: Role };
  /** The full application, drawn by the screen that composes this workspace. */
  renderApplication: (request: OfficeRequest) => ReactNode;
  /** What the screen knows the office should weigh before a move, such as failing as-built readings. */
  cautions?: Cautions;
}

/** One request for the office: what the owner gave, photos, messages, history, and the moves open now. */
export function RequestWorkspace({ requestId, me, renderApplication, cautions }: WorkspaceProps) {
  const [params, setParams] = useSearchParams();
  const tab: Tab = tabs.some((t) => t.id === params.get('tab')) ? (params.get('tab') as Tab) : 'overview';
  const query = useOfficeRequest(requestId);
  if (query.isPending) return <Loading label="Loading the request…" />;
  if (query.error) return <ErrorNotice error={query.error} />;
  const request = query.data.request;

  return (
    <>
      <PageHeader
        title={<span className="font-mono">{request.reference}</span>}
        lead={`${request.applicantName || 'Unnamed applicant'} · ${request.siteAddress || 'no address yet'}`}
        actions={<Link to={paths.office.queue.getHref()} className="text-sm font-semibold text-pine-700 hover:underline">← Back to the queue</Link>}
      />
      <div className="grid gap-6 lg:grid-cols-[1fr_22rem]">
        <div className="min-w-0 space-y-4">
          <nav aria-label="Request sections" className="flex flex-wrap gap-1 border-b border-stone-200">
            {tabs.map((t) => (
              <button key={t.id} type="button" aria-current={tab === t.id ? 'page' : undefined}
                onClick={() => setParams(t.id === 'overview' ? {} : { tab: t.id }, { replace: true })}
                className={`-mb-px border-b-2 px-3 py-2 text-sm font-semibold ${tab === t.id ? 'border-tape-dark text-pine-900' : 'border-transparent text-stone-600 hover:text-pine-700'}`}>
                {t.label}
              </button>
            ))}
            <Link to={paths.office.gradeCheck.getHref(request.id)} className="px-3 py-2 text-sm font-semibold text-stone-600 hover:text-pine-700">Survey and grade check</Link>
          </nav>
          {tab === 'overview' && (
            <>
              <Panel title="At a glance"><RequestFacts request={request} meId={me.id} /></Panel>
              <Panel title="What the owner told us">{renderApplication(request)}</Panel>
            </>
          )}
          {tab === 'photos' && <Panel title="Site photos"><PhotoViewer requestId={request.id} /></Panel>}
          {tab === 'messages' && <Panel title="Messages"><MessageThread requestId={request.id} /></Panel>}
          {tab === 'history' && <Panel title="History"><HistoryList requestId={request.id} /></Panel>}
        </div>
        <aside className="order-first space-y-4 lg:order-none">
          <Panel title="Next step">
            <p className="mb-3 text-sm text-stone-600">{request.whatNext}</p>
            <ActionPanel request={request} role={me.role} cautions={cautions} />
          </Panel>
        </aside>
      </div>
    </>
  );
}
