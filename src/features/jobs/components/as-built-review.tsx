import { Link } from 'react-router';
import { Panel } from '@/components/ui/panel';
import { paths } from '@/config/paths';
import { useAsBuilt } from '../api/get-as-built';
import { SavedSets } from './saved-sets';

/** For the office's review before closing: the crew's latest as-built set as the server judged it. */
export function AsBuiltReview({ requestId }: { requestId: string }) {
  const page = useAsBuilt(requestId);
  if (!page.data) return null;
  return (
    <Panel
      title="As-built grades from the crew"
      actions={
        <Link to={paths.crew.asBuilt.getHref(requestId)} className="text-sm font-semibold text-pine-700 underline">
          Every set, on the crew's screen
        </Link>
      }
    >
      <p className="mb-3 text-sm text-stone-600">
        Checked by the engine against {page.data.ruleProfileLabel}, the version the approved grade check used.
      </p>
      <SavedSets
        sets={page.data.sets.slice(0, 1)}
        basis={{
          ruleProfile: page.data.ruleProfile,
          design: page.data.design,
          roadEdgeStationFt: page.data.roadEdgeStationFt,
        }}
      />
    </Panel>
  );
}
