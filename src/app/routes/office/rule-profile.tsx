import { officeRoles } from '@shared/workflow/roles';
import { Link, useParams, useSearchParams } from 'react-router';
import { RequireRole } from '@/app/layout/require-role';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { PageHeader, Panel } from '@/components/ui/panel';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { useJurisdiction } from '@/features/rule-profiles/api/get-jurisdiction';
import { ProfileForm } from '@/features/rule-profiles/components/profile-form';
import { ProfileView } from '@/features/rule-profiles/components/profile-view';
import { VersionCompare } from '@/features/rule-profiles/components/version-compare';
import { VersionsList } from '@/features/rule-profiles/components/versions-list';

function RuleProfilePage({ id }: { id: string }) {
  const { data, isPending, error } = useJurisdiction(id);
  const me = useMe().data;
  const [params, setParams] = useSearchParams();
  if (isPending) return <Loading />;
  if (error) return <ErrorNotice error={error} />;
  const j = data.jurisdiction;
  const selected =
    j.versions.find((v) => v.id === params.get('version')) ??
    j.versions.find((v) => v.status === 'draft') ??
    j.versions[0];
  const canEdit = me?.role === 'admin';
  return (
    <>
      <PageHeader
        title={j.name}
        lead={j.authority}
        actions={
          <Link
            to={paths.office.ruleProfiles.getHref()}
            className="text-sm font-semibold text-pine-700 hover:underline"
          >
            ← All rule profiles
          </Link>
        }
      />
      <div className="grid gap-6 lg:grid-cols-[18rem_1fr]">
        <Panel title="Versions">
          <VersionsList
            jurisdiction={j}
            selectedId={selected?.id ?? ''}
            canEdit={canEdit}
            onSelect={(version) => setParams({ version }, { replace: true })}
          />
        </Panel>
        <div className="space-y-6">
          {selected && (
            <Panel
              title={`Version ${selected.version} · ${selected.status === 'draft' ? 'draft' : 'published, read only'}`}
            >
              {selected.status === 'draft' && canEdit ? (
                <ProfileForm key={selected.id} version={selected} />
              ) : (
                <ProfileView profile={selected.profile} />
              )}
            </Panel>
          )}
          {j.versions.length > 1 && (
            <Panel title="What changed between versions">
              <VersionCompare versions={j.versions} />
            </Panel>
          )}
        </div>
      </div>
    </>
  );
}

export function Component() {
  const { id = '' } = useParams();
  return (
    <RequireRole roles={officeRoles}>
      <RuleProfilePage key={id} id={id} />
    </RequireRole>
  );
}
