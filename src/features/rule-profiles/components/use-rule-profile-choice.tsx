import { useState, type ReactNode } from 'react';
import type { RuleProfile } from '@shared/engine';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { useJurisdictions } from '../api/get-jurisdictions';
import { useProfileVersion } from '../api/get-version';
import { RuleProfilePicker } from './rule-profile-picker';

export interface RuleProfileChoice {
  /** The picker (or its loading or error notice) to place on the screen. */
  picker: ReactNode;
  /** The chosen authority's current published version, the one a saved check is made against. */
  versionId: string | null;
  rules: RuleProfile | undefined;
  loadingRules: boolean;
}

/** The road authority a check is made against, through the same fetchers the rule-profile screens use. */
export function useRuleProfileChoice(initialJurisdictionId: string | null): RuleProfileChoice {
  const jurisdictions = useJurisdictions();
  const [jurisdictionId, setJurisdictionId] = useState(initialJurisdictionId ?? '');
  const chosen = jurisdictions.data?.jurisdictions.find((j) => j.id === jurisdictionId);
  const versionId = chosen?.currentVersionId ?? null;
  const version = useProfileVersion(versionId ?? undefined);
  const picker = jurisdictions.isPending ? (
    <Loading />
  ) : jurisdictions.error ? (
    <ErrorNotice error={jurisdictions.error} />
  ) : (
    <RuleProfilePicker choices={jurisdictions.data.jurisdictions} value={jurisdictionId} onChange={setJurisdictionId} />
  );
  return { picker, versionId, rules: version.data?.version.profile, loadingRules: version.isFetching };
}
