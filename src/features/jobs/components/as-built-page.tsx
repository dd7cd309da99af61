import { crewPhotoStatuses } from '@shared/contracts/crew-photos';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { PageHeader, Panel } from '@/components/ui/panel';
import { useAsBuilt } from '../api/get-as-built';
import { AsBuiltEntry } from './as-built-entry';
import { CrewPhotoCapture, type PreparePhoto } from './crew-photo-capture';

export function AsBuiltPage({
  id,
  canEnter,
  userId,
  preparePhoto,
}: {
  id: string;
  canEnter: boolean;
  userId?: string;
  /** Given by the screen (the photo feature's metadata cleaning) when the crew lead may add photos. */
  preparePhoto?: PreparePhoto;
}) {
  const page = useAsBuilt(id);
  if (page.isPending) return <Loading label="Loading the job…" />;
  if (page.error) return <ErrorNotice error={page.error} />;
  const { job } = page.data;
  return (
    <>
      <PageHeader title={`As-built grades · ${job.reference}`} lead={job.siteAddress} />
      <AsBuiltEntry page={page.data} canEnter={canEnter} userId={userId} />
      {canEnter && userId && preparePhoto && crewPhotoStatuses.includes(job.status) && (
        <Panel title="Photos for the inspection" className="mt-6">
          <p className="mb-4 text-base text-stone-700">
            The finished entrance, and the culvert before it is backfilled. The office, the property owner and the road
            authority&apos;s inspector see them.
          </p>
          <CrewPhotoCapture requestId={id} jobReference={job.reference} userId={userId} prepare={preparePhoto} />
        </Panel>
      )}
    </>
  );
}
