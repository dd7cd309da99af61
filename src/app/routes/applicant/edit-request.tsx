import { useNavigate, useParams } from 'react-router';
import { RequireRole } from '@/app/layout/require-role';
import { PageHeader } from '@/components/ui/panel';
import { paths } from '@/config/paths';
import { PhotoGallery } from '@/features/photos/components/photo-gallery';
import { PhotoStep } from '@/features/photos/components/photo-step';
import { useRequest } from '@/features/requests/api/get-request';
import { RequestWizard, type PhotoSlotProps } from '@/features/requests/components/request-wizard';

// The wizard's photos: added on their step, shown read-only on the summary.
function WizardPhotos({ requestId, readOnly, ...position }: PhotoSlotProps) {
  return readOnly ? <PhotoGallery requestId={requestId} /> : <PhotoStep requestId={requestId} {...position} />;
}

export function Component() {
  const { id = '' } = useParams();
  const navigate = useNavigate();
  const reference = useRequest(id).data?.request.reference;
  return (
    <RequireRole roles={['applicant']}>
      <PageHeader
        title="Your driveway entrance request"
        lead={reference ? `Reference ${reference}. Saved as you go.` : undefined}
      />
      <RequestWizard
        requestId={id}
        requestHref={paths.applicant.request.getHref(id)}
        onSent={(requestId) => navigate(paths.applicant.request.getHref(requestId))}
        Photos={WizardPhotos}
      />
    </RequireRole>
  );
}
