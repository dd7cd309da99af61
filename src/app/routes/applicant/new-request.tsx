import { useNavigate } from 'react-router';
import { RequireRole } from '@/app/layout/require-role';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/notice';
import { PageHeader, Panel } from '@/components/ui/panel';
import { paths } from '@/config/paths';
import { useCreateRequest } from '@/features/requests/api/create-request';

export function Component() {
  const create = useCreateRequest();
  const navigate = useNavigate();
  const start = () =>
    create.mutate(undefined, {
      onSuccess: ({ request }) => navigate(paths.applicant.editRequest.getHref(request.id), { replace: true }),
    });
  return (
    <RequireRole roles={['applicant']}>
      <PageHeader
        title="Ask for a driveway entrance"
        lead="Four short steps. Your answers are saved as you go, so you can stop and come back."
      />
      <Panel title="What you will need">
        <ul className="mb-5 list-disc space-y-1 pl-5 text-stone-700">
          <li>The property’s address and the name of the road the driveway will meet.</li>
          <li>Roughly where on the road the entrance goes: paced from a landmark, or map coordinates.</li>
          <li>A few photos from the road edge: along the road both ways, the ditch, and towards the house.</li>
        </ul>
        <Button onClick={start} disabled={create.isPending}>
          {create.isPending ? 'Starting…' : 'Start the form'}
        </Button>
        <div className="mt-3">
          <ErrorNotice error={create.error} />
        </div>
      </Panel>
    </RequireRole>
  );
}
