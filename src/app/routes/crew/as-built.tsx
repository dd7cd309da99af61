import { crewScreenRoles } from '@shared/workflow/roles';
import { Link, useParams } from 'react-router';
import { RequireRole } from '@/app/layout/require-role';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { AsBuiltPage } from '@/features/jobs/components/as-built-page';
import type { PreparePhoto } from '@/features/jobs/components/crew-photo-capture';
import { readPosition, withoutMetadata } from '@/features/photos/components/photo-metadata';

// The crew's photos are cleaned exactly as the owner's are: position read first, then the camera's metadata removed.
const preparePhoto: PreparePhoto = async (file) => {
  const position = await readPosition(file);
  const blob = (await withoutMetadata(file, file.type)) ?? file;
  return { blob, position };
};

export function Component() {
  const { id = '' } = useParams();
  const me = useMe().data;
  const crew = me?.role === 'crew';
  return (
    <RequireRole roles={crewScreenRoles}>
      <p className="mb-3 flex flex-wrap gap-4">
        <Link
          to={crew ? paths.crew.myJobs.getHref() : paths.office.request.getHref(id)}
          className="font-semibold text-pine-800 underline"
        >
          {crew ? '← My jobs' : '← The request'}
        </Link>
        <Link to={paths.crew.fieldSheet.getHref(id)} className="font-semibold text-pine-800 underline">
          Field sheet
        </Link>
      </p>
      <AsBuiltPage id={id} canEnter={crew} userId={crew ? me?.id : undefined} preparePhoto={preparePhoto} />
    </RequireRole>
  );
}
