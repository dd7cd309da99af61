import { useState, type ReactNode } from 'react';
import type { RuleProfile } from '@shared/engine';
import { Button } from '@/components/ui/button';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { useJurisdictions } from '../api/get-jurisdictions';
import { useProfileVersion } from '../api/get-version';
import { RuleProfilePicker } from './rule-profile-picker';

export interface RuleProfileChoice {
  /** The picker (or its loading or error notice) to place on the screen. */
  picker: ReactNode;
  /**
   * The version a saved check is made against: the chosen authority's current published one, unless an earlier
   * published version was taken up with a survey (a draft, or "survey again" from a check made against it).
   */
  versionId: string | null;
  rules: RuleProfile | undefined;
  loadingRules: boolean;
  /** Take up a published version (and its authority), as the survey it came with was made against. */
  choose: (versionId: string) => void;
}

interface Choice {
  jurisdictionId: string;
  pinnedVersionId: string | null;
}

/** The road authority a check is made against, through the same fetchers the rule-profile screens use. */
export function useRuleProfileChoice(
  initialJurisdictionId: string | null,
  initialVersionId: string | null = null,
): RuleProfileChoice {
  const jurisdictions = useJurisdictions();
  const [choice, setChoice] = useState<Choice>({
    jurisdictionId: initialJurisdictionId ?? '',
    pinnedVersionId: initialVersionId,
  });
  const list = jurisdictions.data?.jurisdictions;
  const pinnedOwner = choice.pinnedVersionId
    ? list?.find((j) => j.versions.some((v) => v.id === choice.pinnedVersionId && v.status === 'published'))
    : undefined;
  const jurisdictionId = pinnedOwner?.id ?? choice.jurisdictionId;
  const chosen = list?.find((j) => j.id === jurisdictionId);
  const versionId = pinnedOwner ? choice.pinnedVersionId : (chosen?.currentVersionId ?? null);
  const version = useProfileVersion(versionId ?? undefined);
  const earlier =
    pinnedOwner && versionId !== pinnedOwner.currentVersionId
      ? pinnedOwner.versions.find((v) => v.id === versionId)
      : undefined;
  const current = chosen?.versions.find((v) => v.id === chosen.currentVersionId);
  const picker = jurisdictions.isPending ? (
    <Loading />
  ) : jurisdictions.error ? (
    <ErrorNotice error={jurisdictions.error} />
  ) : (
    <>
      <RuleProfilePicker
        choices={jurisdictions.data.jurisdictions}
        value={jurisdictionId}
        onChange={(id) => setChoice({ jurisdictionId: id, pinnedVersionId: null })}
      />
      {earlier && (
        <p className="mt-2 text-sm text-amber-900" role="status">
          Checking against version {earlier.version}, the one this survey was checked against
          {current ? ` (the current one is version ${current.version})` : ''}.{' '}
          <Button variant="quiet" onClick={() => setChoice({ jurisdictionId, pinnedVersionId: null })}>
            Use the current version
          </Button>
        </p>
      )}
    </>
  );
  return {
    picker,
    versionId,
    rules: version.data?.version.profile,
    loadingRules: version.isFetching,
    choose: (id) => setChoice((c) => ({ ...c, pinnedVersionId: id })),
  };
}
