import { Link, useParams } from 'react-router';
import { RequireRole } from '@/app/layout/require-role';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { FieldSheet } from '@/features/crew/components/field-sheet';

export function Component() {
  const { id = '' } = useParams();
  const crew = useMe().data?.role === 'crew';
  return (
    <RequireRole roles={['crew', 'staff', 'admin']}>
      <p className="no-print mb-3"><Link to={crew ? paths.crew.myJobs.getHref() : paths.crew.board.getHref()} className="font-semibold text-pine-800 underline">{crew ? '← My jobs' : '← Released jobs'}</Link></p>
      <FieldSheet id={id} />
    </RequireRole>
  );
}
