import { useState } from 'react';
import { officeRoles } from '@shared/workflow/roles';
import { RequireRole } from '@/app/layout/require-role';
import { ErrorNotice, Loading, Notice } from '@/components/ui/notice';
import { PageHeader, Panel } from '@/components/ui/panel';
import { useMe } from '@/features/auth/api/get-me';
import { useRateCards } from '@/features/rate-cards/api/get-rate-cards';
import { RateCardForm } from '@/features/rate-cards/components/rate-card-form';
import { RateCardPricesView } from '@/features/rate-cards/components/rate-card-prices';
import { RateCardVersions } from '@/features/rate-cards/components/rate-card-versions';

function RateCardPage() {
  const me = useMe().data;
  const query = useRateCards();
  const [picked, setPicked] = useState('');
  if (query.isPending) return <Loading label="Loading the rate card…" />;
  if (query.error) return <ErrorNotice error={query.error} />;
  const { versions, currentId } = query.data;
  const admin = me?.role === 'admin';
  const selected =
    versions.find((v) => v.id === picked) ??
    versions.find((v) => v.status === 'draft') ??
    versions.find((v) => v.id === currentId) ??
    versions[0];
  return (
    <>
      <PageHeader
        title="Rate card"
        lead="The unit prices quotes are made from. Publishing a version makes it the one new quotes use; a quote already made keeps the prices it was made with."
      />
      {!admin && (
        <div className="mb-4">
          <Notice>Only an admin changes prices; you can read every version here.</Notice>
        </div>
      )}
      <div className="grid gap-6 lg:grid-cols-[16rem_1fr]">
        <Panel title="Versions">
          <RateCardVersions versions={versions} selectedId={selected?.id ?? ''} onSelect={setPicked} canEdit={admin} />
        </Panel>
        {selected ? (
          <Panel
            title={`Version ${selected.version} · ${selected.status === 'draft' ? 'draft' : selected.current ? 'current, read only' : 'earlier, read only'}`}
          >
            {selected.status === 'draft' && admin ? (
              <RateCardForm key={selected.id} card={selected} />
            ) : (
              <RateCardPricesView prices={selected.prices} />
            )}
          </Panel>
        ) : (
          <Panel>
            <p className="text-sm text-stone-600">No rate card yet. {admin ? 'Start one from the list.' : ''}</p>
          </Panel>
        )}
      </div>
    </>
  );
}

export function Component() {
  return (
    <RequireRole roles={officeRoles}>
      <RateCardPage />
    </RequireRole>
  );
}
