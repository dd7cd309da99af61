import { Link, useParams } from 'react-router';
import { RequireRole } from '@/app/layout/require-role';
import { paths } from '@/config/paths';
import { AsBuiltPage } from '@/features/crew/components/as-built-page';

export function Component() {
  const { id = '' } = useParams();
  return (
    <RequireRole roles={['crew', 'staff', 'admin']}>
      <p className="mb-3 flex flex-wrap gap-4">
        <Link to={paths.crew.myJobs.getHref()} className="font-semibold text-pine-800 underline">← My jobs</Link>
        <Link to={paths.crew.fieldSheet.getHref(id)} className="font-semibold text-pine-800 underline">Field sheet</Link>
      </p>
      <AsBuiltPage id={id} />
    </RequireRole>
  );
}
