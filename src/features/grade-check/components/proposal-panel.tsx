import { formatStation, type ProposedProfile } from '@shared/engine';
import { haulEstimate, loadsText, type HaulChoice } from '@shared/charts/cut-fill-table';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';

interface ProposalPanelProps {
  proposal?: ProposedProfile;
  requested: boolean;
  applied: boolean;
  haul: HaulChoice;
  /** The proposal is being solved on its own thread. */
  designing?: boolean;
  onSuggest: () => void;
  onApply: (proposal: ProposedProfile) => void;
  onUndo: () => void;
}

const ft = (v: number) => v.toFixed(2);

/** "Suggest a compliant profile": the least-earth design, its cut and fill per station, volumes and truck loads. */
export function ProposalPanel({
  proposal,
  designing,
  requested,
  applied,
  haul,
  onSuggest,
  onApply,
  onUndo,
}: ProposalPanelProps) {
  if (!requested && !applied)
    return (
      <Button variant="secondary" onClick={onSuggest}>
        Suggest a compliant profile
      </Button>
    );
  if (!proposal) {
    return (
      <p role="status" className="text-sm text-stone-600">
        {designing ? 'Working out the least-earth profile…' : 'Finish the survey to get a proposal.'}
      </p>
    );
  }
  if (!proposal.feasible)
    return (
      <Notice tone="warn" title="No compliant profile found">
        {proposal.reason}
      </Notice>
    );
  const estimate = haulEstimate(proposal, haul);
  return (
    <div className="space-y-3">
      <table className="w-full text-sm" aria-label="Cut and fill">
        <thead>
          <tr className="border-b border-stone-300 text-left text-stone-600">
            <th>Station</th>
            <th className="text-right">Ground</th>
            <th className="text-right">Design</th>
            <th className="text-right">Cut (+) / fill (−) ft</th>
          </tr>
        </thead>
        <tbody>
          {proposal.cutFillByStation.map((r) => (
            <tr key={r.stationFt} className="border-b border-stone-100 font-mono">
              <td>{formatStation(r.stationFt)}</td>
              <td className="text-right">{ft(r.existingFt)}</td>
              <td className="text-right">{ft(r.designFt)}</td>
              <td
                className={`text-right ${r.cutFillFt > 0 ? 'text-amber-800' : r.cutFillFt < 0 ? 'text-pine-700' : ''}`}
              >
                {ft(r.cutFillFt)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="text-sm">
        Cut <strong>{estimate.cutCuYd.toFixed(1)} cu yd</strong> ({loadsText(estimate.cutLoads, estimate.truckCuYd)} to
        haul away), fill <strong>{estimate.fillCuYd.toFixed(1)} cu yd</strong> (
        {loadsText(estimate.fillLoads, estimate.truckCuYd)} to bring in), using {estimate.soil} swell and shrink.
      </p>
      {applied ? (
        <Button variant="secondary" onClick={onUndo}>
          Check the ground as surveyed again
        </Button>
      ) : (
        <Button onClick={() => onApply(proposal)}>Apply the suggested profile</Button>
      )}
    </div>
  );
}
