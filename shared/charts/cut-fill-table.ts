import { compactedToBank, soilFactors, truckLoads, unlessRefused, type ProposedProfile } from '../engine';

export type Soil = keyof typeof soilFactors;

export interface HaulChoice {
  soil: Soil;
  truckCuYd: number;
}

export const defaultHaul: HaulChoice = { soil: 'loam', truckCuYd: 10 };

/** "3 loads of 10 cu yd" in words, for the screen and the report alike. */
export function loadsText(count: number | null, truckCuYd: number): string {
  if (count === null) return 'too many truck loads to count: check the survey';
  return count === 0 ? 'no truck loads' : `${count} ${count === 1 ? 'load' : 'loads'} of ${truckCuYd} cu yd`;
}

export interface HaulEstimate extends HaulChoice {
  cutCuYd: number;
  fillCuYd: number;
  /** Cut swells once dug: what the trucks carry away. */
  cutLooseCuYd: number;
  /** Null when the volume is past what the engine estimates loads for (a billion cubic yards): a survey typo. */
  cutLoads: number | null;
  /** Compacted fill needs more bank material, which swells again in the truck. */
  fillLooseCuYd: number;
  fillLoads: number | null;
}

/**
 * The haul that goes with a proposal, for the cut/fill table beside the chart (screen and report alike). Cut and
 * fill are not netted: material from the cut is rarely fit to place as fill without sorting, so both are shown.
 */
const loadsFor = (looseCuYd: number, truckCuYd: number) =>
  unlessRefused(() => truckLoads({ looseCuYd, truckCuYd }).loads);

export function haulEstimate(proposal: ProposedProfile, choice: HaulChoice = defaultHaul): HaulEstimate {
  const factors = soilFactors[choice.soil];
  const cutLooseCuYd = proposal.cutCuYd * factors.bankToLoose;
  const fillBank = compactedToBank({
    compactedCuYd: proposal.fillCuYd,
    shrinkageFactor: factors.bankToCompacted,
  }).bankCuYd;
  const fillLooseCuYd = fillBank * factors.bankToLoose;
  return {
    ...choice,
    cutCuYd: proposal.cutCuYd,
    fillCuYd: proposal.fillCuYd,
    cutLooseCuYd,
    cutLoads: loadsFor(cutLooseCuYd, choice.truckCuYd),
    fillLooseCuYd,
    fillLoads: loadsFor(fillLooseCuYd, choice.truckCuYd),
  };
}
