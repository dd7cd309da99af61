import { crewPhotoStatuses } from '@shared/contracts/crew-photos';
import { crewScreenRoles } from '@shared/workflow/roles';
import { Link, useParams } from 'react-router';
import { RequireRole } from '@/app/layout/require-role';
import { Panel } from '@/components/ui/panel';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { InspectionPanel } from '@/features/inspections/components/inspection-panel';
import { useAsBuilt } from '@/features/jobs/api/get-as-built';
import { AsBuiltPage } from '@/features/jobs/components/as-built-page';
import { CrewPhotoUploader } from '@/features/photos/components/crew-photo-uploader';
import { CrewPhotos } from '@/features/photos/components/crew-photos';

/** The crew's photos and the inspection's outcome, below the readings: what the inspector will look at. */
function PhotosAndInspection({ id, crew }: { id: string; crew: boolean }) {
  const status = useAsBuilt(id).data?.job.status;
  if (!status) return null;
  const canAdd = crew && crewPhotoStatuses.includes(status);
  return (
    <div className="mt-6 space-y-6">
      <Panel title="Crew photos">
        <div className="space-y-4">
          {canAdd && (
            <p className="text-sm text-stone-600">
              Photograph the culvert before backfill and the finished entrance: the road authority’s inspector sees
              them.
            </p>
          )}
          {canAdd && <CrewPhotoUploader requestId={id} />}
          <CrewPhotos requestId={id} canRemove={canAdd} />
        </div>
      </Panel>
      <Panel title="Inspection">
        <InspectionPanel requestId={id} status={status} />
      </Panel>
    </div>
  );
}

export function Component() {
  const { id = '' } = useParams();
  const crew = useMe().data?.role === 'crew';
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
      <AsBuiltPage id={id} canEnter={crew} />
      <PhotosAndInspection id={id} crew={crew} />
    </RequireRole>
  );
}
