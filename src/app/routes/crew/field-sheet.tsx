import { crewScreenRoles } from '@shared/workflow/roles';
import { Link, useParams } from 'react-router';
import { RequireRole } from '@/app/layout/require-role';
import { Panel } from '@/components/ui/panel';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { useFieldSheet } from '@/features/jobs/api/get-field-sheet';
import { FieldSheet } from '@/features/jobs/components/field-sheet';
import { MessageThread } from '@/features/messages/components/message-thread';

export function Component() {
  const { id = '' } = useParams();
  const me = useMe().data;
  const crew = me?.role === 'crew';
  // The conversation is the crew's only while it holds the job; the office has its own in the workspace.
  const sheet = useFieldSheet(id);
  const holdsJob = crew && sheet.data?.job.crewId === me?.id;
  return (
    <RequireRole roles={crewScreenRoles}>
      <p className="no-print mb-3">
        <Link
          to={crew ? paths.crew.myJobs.getHref() : paths.crew.board.getHref()}
          className="font-semibold text-pine-800 underline"
        >
          {crew ? '← My jobs' : '← Released jobs'}
        </Link>
      </p>
      <FieldSheet id={id} />
      {holdsJob && (
        <Panel title="Messages with the homeowner and the office" className="no-print mt-6">
          <MessageThread requestId={id} writeLabel="Write to the homeowner and the office" />
        </Panel>
      )}
    </RequireRole>
  );
}
