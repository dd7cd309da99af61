import type { ReactNode } from 'react';
import { Link, useSearchParams } from 'react-router';
import type { Role } from '@shared/workflow/statuses';
import type { OfficeRequestView } from '@shared/contracts/requests';
import { PageHeader, Panel } from '@/components/ui/panel';
import { paths } from '@/config/paths';
import { ActionPanel, type Cautions } from './action-panel';
import { RequestFacts } from './request-facts';

const tabs = [
  { id: 'overview', label: 'Overview' },
  { id: 'quote', label: 'Quote' },
  { id: 'photos', label: 'Photos' },
  { id: 'messages', label: 'Messages' },
  { id: 'history', label: 'History' },
] as const;
type Tab = (typeof tabs)[number]['id'];

interface WorkspaceProps {
  request: OfficeRequestView;
  me: { id: string; role: Role };
  /** The parts other features draw, composed by the screen: the full application, photos, messages, history. */
  sections: Record<'application' | 'quote' | 'photos' | 'messages' | 'history', () => ReactNode> & {
    /** The money side (agreed price, deposit, balance), beside the next step. */
    money?: () => ReactNode;
    /** The permit packet and the authority's letter, once the request has a check to file. */
    permit?: () => ReactNode;
  };
  /** What the screen knows the office should weigh before a move, such as failing as-built readings. */
  cautions?: Cautions;
}

/** One request for the office: what the owner gave, photos, messages, history, and the moves open now. */
export function RequestWorkspace({ request, me, sections, cautions }: WorkspaceProps) {
  const [params, setParams] = useSearchParams();
  const tab: Tab = tabs.some((t) => t.id === params.get('tab')) ? (params.get('tab') as Tab) : 'overview';

  return (
    <>
      <PageHeader
        title={<span className="font-mono">{request.reference}</span>}
        lead={`${request.applicantName || 'Unnamed applicant'} · ${request.siteAddress || 'no address yet'}`}
        actions={
          <Link to={paths.office.queue.getHref()} className="text-sm font-semibold text-pine-700 hover:underline">
            ← Back to the queue
          </Link>
        }
      />
      <div className="grid gap-6 lg:grid-cols-[1fr_22rem]">
        <div className="min-w-0 space-y-4">
          <nav aria-label="Request sections" className="flex flex-wrap gap-1 border-b border-stone-200">
            {tabs.map((t) => (
              <button
                key={t.id}
                type="button"
                aria-current={tab === t.id ? 'page' : undefined}
                onClick={() => setParams(t.id === 'overview' ? {} : { tab: t.id }, { replace: true })}
                className={`-mb-px border-b-2 px-3 py-2 text-sm font-semibold ${tab === t.id ? 'border-tape-dark text-pine-900' : 'border-transparent text-stone-600 hover:text-pine-700'}`}
              >
                {t.label}
              </button>
            ))}
            <Link
              to={paths.office.gradeCheck.getHref(request.id)}
              className="px-3 py-2 text-sm font-semibold text-stone-600 hover:text-pine-700"
            >
              Survey and grade check
            </Link>
          </nav>
          {tab === 'overview' && (
            <>
              <Panel title="At a glance">
                <RequestFacts request={request} meId={me.id} />
              </Panel>
              <Panel title="What the owner told us">{sections.application()}</Panel>
            </>
          )}
          {tab === 'quote' && <Panel title="Quote">{sections.quote()}</Panel>}
          {tab === 'photos' && <Panel title="Site photos">{sections.photos()}</Panel>}
          {tab === 'messages' && <Panel title="Messages">{sections.messages()}</Panel>}
          {tab === 'history' && <Panel title="History">{sections.history()}</Panel>}
        </div>
        <aside className="order-first space-y-4 lg:order-none">
          <Panel title="Next step">
            <p className="mb-3 text-sm text-stone-600">{request.whatNext}</p>
            <ActionPanel request={request} role={me.role} cautions={cautions} />
          </Panel>
          {sections.money && <Panel title="Money">{sections.money()}</Panel>}
          {sections.permit && <Panel title="Permit">{sections.permit()}</Panel>}
        </aside>
      </div>
    </>
  );
}
