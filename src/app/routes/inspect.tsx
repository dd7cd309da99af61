import { useLocation, useParams } from 'react-router';
import { Logo } from '@/app/layout/logo';
import { ErrorNotice, Loading, Notice } from '@/components/ui/notice';
import { useInspectorPage } from '@/features/inspections/api/get-inspector-page';
import { InspectorView } from '@/features/inspections/components/inspector-view';
import { CrewPhotoGrid } from '@/features/photos/components/crew-photo-grid';
import { ApiError } from '@/lib/api-client';

/** The link's token rides in the address's #fragment, which the browser never sends to a server. */
const tokenOf = (hash: string) => new URLSearchParams(hash.replace(/^#/, '')).get('t') ?? '';

function InspectorScreen() {
  const { id = '' } = useParams();
  const token = tokenOf(useLocation().hash);
  const query = useInspectorPage(id, token);
  if (!token || (query.error instanceof ApiError && query.error.status === 404)) {
    return (
      <Notice tone="warn" title="This inspection link does not open a page.">
        It may have expired or been withdrawn, or been copied only in part. Ask the office that sent it for a new link.
      </Notice>
    );
  }
  if (query.isPending) return <Loading label="Loading the inspection page…" />;
  if (query.error) return <ErrorNotice error={query.error} />;
  return (
    <InspectorView
      page={query.data}
      token={token}
      photos={<CrewPhotoGrid photos={query.data.crewPhotos} emptyText="The crew added no photos." />}
    />
  );
}

/** The road authority inspector's page: outside the signed-in shell, since the inspector has no account. */
export function Component() {
  return (
    <div className="flex min-h-screen flex-col">
      <header className="border-b-4 border-tape bg-pine-800 px-4 py-3 text-white">
        <div className="mx-auto max-w-3xl">
          <Logo />
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-3xl flex-1 px-4 py-6">
        <InspectorScreen />
      </main>
    </div>
  );
}
