import type { EarthworkEstimate } from '@shared/crew/crew-views';
import { cuYd } from './format';

/** Cut, fill and the truck trips they mean, in one line a crew lead can judge a job by. */
export function EarthworkLine({ earthwork }: { earthwork: EarthworkEstimate | null }) {
  if (!earthwork) return <p className="text-stone-600">No earthwork estimate in the saved check.</p>;
  const { cutCuYd, fillCuYd, netLooseCuYd, truckLoads, truckCuYd } = earthwork;
  const haul =
    truckLoads === 0
      ? 'cut and fill balance on site'
      : `${truckLoads} truck ${truckLoads === 1 ? 'load' : 'loads'} to ${netLooseCuYd > 0 ? 'haul away' : 'bring in'} (${cuYd(Math.abs(netLooseCuYd))} loose, ${truckCuYd} cu yd trucks)`;
  return (
    <p>
      Cut <strong>{cuYd(cutCuYd)}</strong>, fill <strong>{cuYd(fillCuYd)}</strong>: {haul}.
    </p>
  );
}
