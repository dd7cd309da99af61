import { ErrorNotice, Loading } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/panel';
import { useAsBuilt } from '../api/get-as-built';
import { AsBuiltEntry } from './as-built-entry';

export function AsBuiltPage({ id, canEnter, userId }: { id: string; canEnter: boolean; userId?: string }) {
  const page = useAsBuilt(id);
  if (page.isPending) return <Loading label="Loading the job…" />;
  if (page.error) return <ErrorNotice error={page.error} />;
  return (
    <>
      <PageHeader title={`As-built grades · ${page.data.job.reference}`} lead={page.data.job.siteAddress} />
      <AsBuiltEntry page={page.data} canEnter={canEnter} userId={userId} />
    </>
  );
}
