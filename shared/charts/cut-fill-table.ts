import { compactedToBank, soilFactors, truckLoads, type ProposedProfile } from '../engine';

export type Soil = keyof typeof soilFactors;

export interface HaulChoice {
  soil: Soil;
  truckCuYd: number;
}

export const defaultHaul: HaulChoice = { soil: 'loam', truckCuYd: 10 };

export interface HaulEstimate extends HaulChoice {
  cutCuYd: number;
  fillCuYd: number;
  /** Cut swells once dug: what the trucks carry away. */
  cutLooseCuYd: number;
  cutLoads: number;
  /** Compacted fill needs more bank material, which swells again in the truck. */
  fillLooseCuYd: number;
  fillLoads: number;
}

/**
 * The haul that goes with a proposal, for the cut/fill table beside the chart (screen and report alike). Cut and
 * fill are not netted: material from the cut is rarely fit to place as fill without sorting, so both are shown.
 */
export function haulEstimate(proposal: ProposedProfile, choice: HaulChoice = defaultHaul): HaulEstimate {
  const factors = soilFactors[choice.soil];
  const cutLooseCuYd = proposal.cutCuYd * factors.bankToLoose;
  const fillBank = compactedToBank({ compactedCuYd: proposal.fillCuYd, shrinkageFactor: factors.bankToCompacted }).bankCuYd;
  const fillLooseCuYd = fillBank * factors.bankToLoose;
  return {
    ...choice,
    cutCuYd: proposal.cutCuYd,
    fillCuYd: proposal.fillCuYd,
    cutLooseCuYd,
    cutLoads: truckLoads({ looseCuYd: cutLooseCuYd, truckCuYd: choice.truckCuYd }).loads,
    fillLooseCuYd,
    fillLoads: truckLoads({ looseCuYd: fillLooseCuYd, truckCuYd: choice.truckCuYd }).loads,
  };
}
