import { useNavigate } from 'react-router';
import { RequireRole } from '@/app/layout/require-role';
import { Button } from '@/components/ui/button';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { PageHeader, Panel } from '@/components/ui/panel';
import { paths } from '@/config/paths';
import { useCreateRequest } from '@/features/requests/api/create-request';
import { useMyRequests } from '@/features/requests/api/get-my-requests';
import { OpenDrafts } from '@/features/requests/components/open-drafts';

function StartForm() {
  const create = useCreateRequest();
  const mine = useMyRequests();
  const navigate = useNavigate();
  const start = () =>
    create.mutate(undefined, {
      onSuccess: ({ request }) => navigate(paths.applicant.editRequest.getHref(request.id), { replace: true }),
    });
  if (mine.isPending) return <Loading />;
  const drafts = mine.data?.requests.filter((r) => r.status === 'draft') ?? [];
  return (
    <>
      {drafts.length > 0 && (
        <Panel title={drafts.length === 1 ? 'You have a request not sent yet' : 'You have requests not sent yet'}>
          <p className="mb-2 text-sm text-stone-700">
            Carry on where you stopped, or delete one you no longer need. A new form is only for another entrance.
          </p>
          <OpenDrafts drafts={drafts} hrefFor={(id) => paths.applicant.editRequest.getHref(id)} />
        </Panel>
      )}
      <Panel title="What you will need">
        <ul className="mb-5 list-disc space-y-1 pl-5 text-stone-700">
          <li>The property’s address and the name of the road the driveway will meet.</li>
          <li>Roughly where on the road the entrance goes: paced from a landmark, or map coordinates.</li>
          <li>A few photos from the road edge: along the road both ways, the ditch, and towards the house.</li>
        </ul>
        <Button onClick={start} disabled={create.isPending} variant={drafts.length > 0 ? 'secondary' : 'primary'}>
          {create.isPending ? 'Starting…' : drafts.length > 0 ? 'Start a form for another entrance' : 'Start the form'}
        </Button>
        <div className="mt-3">
          <ErrorNotice error={create.error} />
          <ErrorNotice error={mine.error} />
        </div>
      </Panel>
    </>
  );
}

export function Component() {
  return (
    <RequireRole roles={['applicant']}>
      <PageHeader
        title="Ask for a driveway entrance"
        lead="Four short steps. Your answers are saved as you go, so you can stop and come back."
      />
      <div className="space-y-6">
        <StartForm />
      </div>
    </RequireRole>
  );
}
