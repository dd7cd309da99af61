import type { GradeCheckDraftView, GradeCheckRequestHeader, GradeCheckView } from '@shared/contracts/grade-checks';
import { officeRoles } from '@shared/workflow/roles';
import { Link, useParams } from 'react-router';
import { RequireRole } from '@/app/layout/require-role';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { PageHeader, Panel } from '@/components/ui/panel';
import { StatusBadge } from '@/components/ui/status-badge';
import { paths } from '@/config/paths';
import { useGradeCheckDraft } from '@/features/grade-check/api/get-grade-check-draft';
import { useGradeChecks } from '@/features/grade-check/api/get-grade-checks';
import { DocumentsList } from '@/features/grade-check/components/documents-list';
import { GradeCheckWorkspace } from '@/features/grade-check/components/grade-check-workspace';
import { SavedChecks } from '@/features/grade-check/components/saved-checks';
import { useRuleProfileChoice } from '@/features/rule-profiles/components/use-rule-profile-choice';

// Mounted once the request is loaded, so the picker starts on the request's own road authority.
// The caller's survey draft is read first, so the form and the picker open on what was typed.
function Workspace({ request, checks }: { request: GradeCheckRequestHeader; checks: GradeCheckView[] }) {
  const draft = useGradeCheckDraft(request.id);
  if (draft.isPending) return <Loading label="Loading your survey draft…" />;
  if (draft.error) return <ErrorNotice error={draft.error} />;
  return <DraftedWorkspace request={request} checks={checks} draft={draft.data.draft} />;
}

function DraftedWorkspace({
  request,
  checks,
  draft,
}: {
  request: GradeCheckRequestHeader;
  checks: GradeCheckView[];
  draft: GradeCheckDraftView | null;
}) {
  const ruleProfile = useRuleProfileChoice(request.jurisdictionId, draft?.ruleProfileVersionId ?? null);
  return <GradeCheckWorkspace request={request} checks={checks} ruleProfile={ruleProfile} draft={draft} />;
}

function GradeCheckPage({ id }: { id: string }) {
  const { data, isPending, error } = useGradeChecks(id);
  if (isPending) return <Loading label="Loading the request…" />;
  if (error) return <ErrorNotice error={error} />;
  const { request, checks } = data;
  return (
    <>
      <PageHeader
        title={
          <>
            Survey and grade check <span className="font-mono text-xl">{request.reference}</span>
          </>
        }
        lead={`${request.applicantName} · ${request.siteAddress}${request.roadName ? ` on ${request.roadName}` : ''}`}
        actions={
          <>
            <StatusBadge status={request.status} />
            <Link
              to={paths.office.request.getHref(request.id)}
              className="text-sm font-semibold text-pine-700 hover:underline"
            >
              ← Back to the request
            </Link>
          </>
        }
      />
      <div className="space-y-6">
        <Workspace request={request} checks={checks} />
        <div className="grid gap-6 lg:grid-cols-2">
          <Panel title="Saved checks">
            <SavedChecks request={request} checks={checks} />
          </Panel>
          <Panel title="Documents">
            <DocumentsList requestId={request.id} canShare />
          </Panel>
        </div>
      </div>
    </>
  );
}

export function Component() {
  const { id = '' } = useParams();
  return (
    <RequireRole roles={officeRoles}>
      <GradeCheckPage key={id} id={id} />
    </RequireRole>
  );
}
