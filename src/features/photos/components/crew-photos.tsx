import { ErrorNotice, Loading } from '@/components/ui/notice';
import { useCrewPhotos } from '../api/get-crew-photos';
import { useRemoveCrewPhoto } from '../api/remove-crew-photo';
import { CrewPhotoGrid } from './crew-photo-grid';

/** The crew's photos of a request, for the office, the owner and the crew; the crew lead may take one back. */
export function CrewPhotos({ requestId, canRemove = false }: { requestId: string; canRemove?: boolean }) {
  const { data, error, isPending } = useCrewPhotos(requestId);
  const remove = useRemoveCrewPhoto(requestId);
  if (isPending) return <Loading label="Loading the crew’s photos…" />;
  if (error) return <ErrorNotice error={error} />;
  return (
    <div className="space-y-2">
      <CrewPhotoGrid photos={data.photos} onRemove={canRemove ? (id) => remove.mutate(id) : undefined} />
      <ErrorNotice error={remove.error} />
    </div>
  );
}
