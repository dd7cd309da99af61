import {
  bankToLoose,
  earthworkFromProfiles,
  soilFactors,
  truckLoads,
  unlessRefused,
  type ProfilePoint,
} from '@shared/engine';
import { timingText, timings } from '@shared/requests/choices';
import type { EarthworkEstimate, Wanted, Yard } from '@shared/crew/crew-views';
import type { SavedCheck } from './saved-check';

// Without the office's choice: loam, and a tandem dump truck of about 10 cu yd loose (common practice, no source).
const DEFAULT_TRUCK_CU_YD = 10;

function volumes(check: SavedCheck): { cutCuYd: number; fillCuYd: number } | null {
  const { proposal, design, existingPoints, designPoints } = check;
  if (design?.applied && proposal?.feasible) return { cutCuYd: proposal.cutCuYd, fillCuYd: proposal.fillCuYd };
  if (!design || !existingPoints) return null;
  try {
    const { cutCuYd, fillCuYd } = earthworkFromProfiles({
      existing: existingPoints,
      design: designPoints,
      template: design.template,
    });
    return { cutCuYd, fillCuYd };
  } catch {
    return null;
  }
}

/**
 * Cut and fill from the saved check, and the truck trips they mean: cut is reused as fill first (fill needs more
 * bank soil than its compacted volume), and only what is left over, swelled to loose, goes by truck.
 */
export function earthworkEstimate(check: SavedCheck | null): EarthworkEstimate | null {
  if (!check) return null;
  const v = volumes(check);
  if (!v) return null;
  const soilName = check.design?.haul?.soil ?? 'loam';
  const soil = soilFactors[soilName];
  const truckCuYd = check.design?.haul?.truckCuYd ?? DEFAULT_TRUCK_CU_YD;
  const bankForFill = v.fillCuYd / soil.bankToCompacted;
  const spareBank = v.cutCuYd - bankForFill;
  // Volumes past the engine's range (a billion cubic yards) come only from a survey typo: no estimate, not no board.
  return unlessRefused(() => {
    const loose = bankToLoose({ bankCuYd: Math.abs(spareBank), swellPercent: (soil.bankToLoose - 1) * 100 }).looseCuYd;
    return {
      cutCuYd: v.cutCuYd,
      fillCuYd: v.fillCuYd,
      netLooseCuYd: spareBank >= 0 ? loose : -loose,
      truckCuYd,
      truckLoads: truckLoads({ looseCuYd: loose, truckCuYd }).loads,
      basis: `${soilName}: swell ${Math.round((soil.bankToLoose - 1) * 100)}%, fill compacts to ${Math.round(soil.bankToCompacted * 100)}% of bank; ${truckCuYd} cu yd per truck`,
    };
  });
}

const isTiming = (v: unknown): v is (typeof timings)[number] =>
  typeof v === 'string' && (timings as readonly string[]).includes(v);

const isoDay = (d: Date) => d.toISOString().slice(0, 10);

/**
 * The homeowner chose how soon, not a day; "wanted by" turns that into a date counted from when they sent the
 * request, so the board can sort on it. "No hurry" has no date and sorts last.
 */
export function wantedFrom(application: unknown, submittedAt: Date | null): Wanted {
  const timing = (application as { entrance?: { timing?: unknown } } | null)?.entrance?.timing;
  if (!isTiming(timing)) return { timing: 'unknown', label: 'Not given', wantedBy: null };
  const from = submittedAt ?? new Date();
  let wantedBy: string | null = null;
  if (timing === 'soon') wantedBy = isoDay(from);
  else if (timing === 'within_3_months') {
    const d = new Date(from);
    d.setUTCMonth(d.getUTCMonth() + 3);
    wantedBy = isoDay(d);
  } else if (timing === 'this_year') wantedBy = `${from.getUTCFullYear()}-12-31`;
  return { timing, label: timingText[timing], wantedBy };
}

const EARTH_RADIUS_MILES = 3958.8;
const rad = (deg: number) => (deg * Math.PI) / 180;

/** Straight-line (great-circle) distance: enough to order jobs by how far the crew drives. */
export function milesBetween(a: { lat: number; lng: number }, b: { lat: number; lng: number }): number {
  const h =
    Math.sin(rad(b.lat - a.lat) / 2) ** 2 +
    Math.cos(rad(a.lat)) * Math.cos(rad(b.lat)) * Math.sin(rad(b.lng - a.lng) / 2) ** 2;
  return 2 * EARTH_RADIUS_MILES * Math.asin(Math.min(1, Math.sqrt(h)));
}

export function distanceFromYard(yard: Yard | null, lat: number | null, lng: number | null): number | null {
  if (!yard || lat === null || lng === null) return null;
  return Math.round(milesBetween(yard, { lat, lng }) * 10) / 10;
}

export type { ProfilePoint };

/** Where the site is: the office's own pin first, else what the homeowner gave in the form. */
export function siteCoordinates(r: { siteLat: number | null; siteLng: number | null; application: unknown }): {
  lat: number | null;
  lng: number | null;
} {
  if (r.siteLat !== null && r.siteLng !== null) return { lat: r.siteLat, lng: r.siteLng };
  const site = (r.application as { site?: { siteLat?: unknown; siteLng?: unknown } } | null)?.site;
  const lat = typeof site?.siteLat === 'number' ? site.siteLat : null;
  const lng = typeof site?.siteLng === 'number' ? site.siteLng : null;
  return lat !== null && lng !== null ? { lat, lng } : { lat: null, lng: null };
}
