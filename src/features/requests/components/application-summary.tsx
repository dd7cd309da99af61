import type { ApplicationDraft } from '@shared/requests/application-schema';
import {
  drainageKindText,
  entranceUseText,
  entranceWorkText,
  roadOwnerText,
  timingText,
  vehicleKindText,
} from '@shared/requests/choices';

const unknown = 'Not given';
const withUnit = (value: number | null | undefined, unit: string) =>
  value === null || value === undefined ? unknown : `${value} ${unit}`;

function position(site: NonNullable<ApplicationDraft['site']>) {
  if (site.positionKind === 'coordinates') {
    return site.siteLat != null && site.siteLng != null
      ? `${site.siteLat.toFixed(5)}, ${site.siteLng.toFixed(5)}`
      : unknown;
  }
  if (!site.landmark) return unknown;
  return `${withUnit(site.distanceFromLandmarkFt, 'ft')} from ${site.landmark}`;
}

/** The answers as the office will read them, in the wizard's own words. */
export function ApplicationSummary({ application }: { application: ApplicationDraft }) {
  const site = application.site ?? {};
  const entrance = application.entrance ?? {};
  const rows: [string, string][] = [
    ['Address', site.address || unknown],
    ['Parcel number', site.parcelNumber || unknown],
    ['Road', site.roadName || unknown],
    ['Road owner', site.roadOwner ? roadOwnerText[site.roadOwner] : unknown],
    ['Posted speed', withUnit(site.postedSpeedMph, 'mph')],
    ['Position on the road', position(site)],
    ['Entrance', entrance.work ? entranceWorkText[entrance.work] : unknown],
    ['Serves', entrance.use ? entranceUseText[entrance.use] : unknown],
    ['Vehicles', entrance.vehicles?.length ? entrance.vehicles.map((v) => vehicleKindText[v]).join('; ') : unknown],
    ['Driveway length', withUnit(entrance.drivewayLengthFt, 'ft')],
    ['Rise to the house', withUnit(entrance.riseToHouseFt, 'ft')],
    ['Ditch or culvert', entrance.existingDrainage ? drainageKindText[entrance.existingDrainage] : unknown],
    ['Timing', entrance.timing ? timingText[entrance.timing] : unknown],
    ['Notes', entrance.notes || '—'],
  ];
  return (
    <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[12rem_1fr]">
      {rows.map(([label, value]) => (
        <div key={label} className="contents">
          <dt className="font-semibold text-stone-600">{label}</dt>
          <dd className="whitespace-pre-line text-stone-900">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
