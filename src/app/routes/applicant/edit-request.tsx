import { useNavigate, useParams } from 'react-router';
import { RequireRole } from '@/app/layout/require-role';
import { PageHeader } from '@/components/ui/panel';
import { paths } from '@/config/paths';
import { PhotoGallery } from '@/features/photos/components/photo-gallery';
import { PhotoStep } from '@/features/photos/components/photo-step';
import { useRequest } from '@/features/requests/api/get-request';
import { RequestWizard } from '@/features/requests/components/request-wizard';

export function Component() {
  const { id = '' } = useParams();
  const navigate = useNavigate();
  const reference = useRequest(id).data?.request.reference;
  return (
    <RequireRole roles={['applicant']}>
      <PageHeader title="Your driveway entrance request" lead={reference ? `Reference ${reference}. Saved as you go.` : undefined} />
      <RequestWizard requestId={id} requestHref={paths.applicant.request.getHref(id)}
        onSent={(requestId) => navigate(paths.applicant.request.getHref(requestId))}
        renderPhotos={({ requestId, readOnly, onUsePosition }) => (readOnly
          ? <PhotoGallery requestId={requestId} />
          : <PhotoStep requestId={requestId} onUsePosition={onUsePosition} />)} />
    </RequireRole>
  );
}
