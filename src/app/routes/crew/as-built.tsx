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
import { CrewPhotoCapture, type PreparePhoto } from '@/features/jobs/components/crew-photo-capture';
import { readPosition, withoutMetadata } from '@/features/photos/components/photo-metadata';
import { CrewPhotos } from '@/features/photos/components/crew-photos';

// The crew's photos are cleaned exactly as the owner's are: position read first, then the camera's metadata removed.
const preparePhoto: PreparePhoto = async (file, type) => {
  const position = await readPosition(file);
  const blob = (await withoutMetadata(file, type)) ?? file;
  return { blob, position };
};

/** The crew's photos and the inspection's outcome, below the readings: what the inspector will look at. */
function PhotosAndInspection({ id, userId }: { id: string; userId?: string }) {
  const job = useAsBuilt(id).data?.job;
  const status = job?.status;
  if (!job || !status) return null;
  const crew = userId !== undefined;
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
          {/* Through the phone's send queue, signal or not: kept on the phone first, sent once when it can be. */}
          {canAdd && userId && (
            <CrewPhotoCapture requestId={id} jobReference={job.reference} userId={userId} prepare={preparePhoto} />
          )}
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
      <AsBuiltPage id={id} canEnter={crew} userId={crew ? me?.id : undefined} />
      <PhotosAndInspection id={id} userId={crew ? me?.id : undefined} />
    </RequireRole>
  );
}
