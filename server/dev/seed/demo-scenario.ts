import type { SubmittedApplication } from '@shared/requests/application-schema';
import type { RequestStatus } from '@shared/workflow/statuses';
import { demoGround, type DemoSite } from './demo-survey';

export interface DemoRequest {
  status: RequestStatus;
  applicant: string;
  office?: string;
  crew?: string;
  jurisdiction: 'marrow-county' | 'town-of-elderbrook';
  /** How long ago the request was started. */
  ageDays: number;
  application: SubmittedApplication;
  site?: DemoSite;
  permitReference?: string;
  permitConditions?: string;
  notes?: Partial<Record<RequestStatus, string>>;
  messages?: { from: string; visibility: 'internal' | 'shared'; body: string }[];
}

const ellen = 'ellen.marsh@example.test';
const sam = 'sam.whitcombe@example.test';
const ravi = 'ravi.castellanos@example.test';
const nora = 'nora.fitzgerald@example.test';
const tomasz = 'tomasz.reyes@gradepass.test';
const jo = 'jo.haverford@gradepass.test';
const marcus = 'marcus.bell@gradepass.test';

function application(
  site: Partial<SubmittedApplication['site']> & { address: string; roadName: string },
  entrance: Partial<SubmittedApplication['entrance']> = {},
): SubmittedApplication {
  return {
    site: {
      parcelNumber: '',
      roadOwner: 'county',
      postedSpeedMph: 40,
      positionKind: 'landmark',
      landmark: 'the mailbox post',
      distanceFromLandmarkFt: 60,
      siteLat: null,
      siteLng: null,
      ...site,
    },
    entrance: {
      work: 'new',
      use: 'home',
      vehicles: ['cars'],
      drivewayLengthFt: 120,
      riseToHouseFt: 8,
      existingDrainage: 'ditch',
      timing: 'within_3_months',
      notes: '',
      ...entrance,
    },
  };
}

const gentle: DemoSite = {
  ground: demoGround(2.5, 9),
  speedMph: 40,
  sightLeftFt: 640,
  sightRightFt: 590,
  roadGradePercent: 1.1,
};
const steepLanding: DemoSite = {
  ground: demoGround(5.5, 11),
  speedMph: 35,
  sightLeftFt: 520,
  sightRightFt: 470,
  roadGradePercent: -0.8,
};
const hillside: DemoSite = {
  ground: demoGround(4.5, 14, 100),
  speedMph: 30,
  sightLeftFt: 410,
  sightRightFt: 380,
  roadGradePercent: 2.4,
};

const countyConditions =
  'Traffic control on the county road while working in the right-of-way; county inspection of the culvert before backfill.';
const townConditions =
  'Notify Elderbrook Public Works two working days before work; restore the road shoulder with crushed stone.';

/** Invented people, roads and places: one request in each status, across the two demo road authorities. */
export const demoScenario: DemoRequest[] = [
  {
    status: 'draft',
    applicant: ellen,
    jurisdiction: 'marrow-county',
    ageDays: 1,
    application: application({
      address: '418 Cobblers Hollow Road, Marrow Crossing',
      roadName: 'Cobblers Hollow Road',
    }),
  },
  {
    status: 'submitted',
    applicant: sam,
    jurisdiction: 'town-of-elderbrook',
    ageDays: 2,
    application: application(
      {
        address: '77 Pennywhistle Lane, Elderbrook',
        roadName: 'Pennywhistle Lane',
        roadOwner: 'town',
        postedSpeedMph: 25,
      },
      { vehicles: ['cars', 'trailers'], notes: 'We tow a small camper in and out twice a year.' },
    ),
  },
  {
    status: 'needs_details',
    applicant: ravi,
    jurisdiction: 'marrow-county',
    ageDays: 6,
    application: application(
      { address: '1290 Stonecrop Pike, Marrow Crossing', roadName: 'Stonecrop Pike', postedSpeedMph: 45 },
      { existingDrainage: 'not_sure', use: 'farm', vehicles: ['cars', 'trucks'] },
    ),
    notes: {
      needs_details: 'Is there a pipe under the old field gate already? A photo of the ditch from the road would help.',
    },
  },
  {
    status: 'visit_booked',
    applicant: nora,
    jurisdiction: 'marrow-county',
    ageDays: 8,
    application: application({
      address: '35 Tanager Way, Marrow Crossing',
      roadName: 'Tanager Way',
      siteLat: 44.2031,
      siteLng: -72.6012,
      positionKind: 'coordinates',
    }),
    messages: [
      {
        from: 'priya.lindqvist@gradepass.test',
        visibility: 'shared',
        body: 'We will be on site Thursday morning; no need to be home.',
      },
      {
        from: 'priya.lindqvist@gradepass.test',
        visibility: 'internal',
        body: 'Ditch holds water after rain: bring the 18 in pipe sample and the probe.',
      },
    ],
  },
  {
    status: 'checked',
    applicant: ellen,
    jurisdiction: 'town-of-elderbrook',
    ageDays: 14,
    site: gentle,
    application: application({
      address: '2 Quillfeather Road, Elderbrook',
      roadName: 'Quillfeather Road',
      roadOwner: 'town',
      postedSpeedMph: 30,
    }),
  },
  {
    status: 'permit_filed',
    applicant: sam,
    jurisdiction: 'marrow-county',
    ageDays: 20,
    site: steepLanding,
    permitReference: 'MC-DA-2026-0412',
    application: application(
      { address: '904 Old Mill Road, Marrow Crossing', roadName: 'Old Mill Road' },
      { drivewayLengthFt: 210, riseToHouseFt: 19 },
    ),
  },
  {
    status: 'permit_granted',
    applicant: ravi,
    jurisdiction: 'town-of-elderbrook',
    ageDays: 26,
    site: gentle,
    permitReference: 'EPW-2026-118',
    permitConditions: townConditions,
    application: application({
      address: '51 Bramblewood Drive, Elderbrook',
      roadName: 'Bramblewood Drive',
      roadOwner: 'town',
      postedSpeedMph: 25,
    }),
  },
  {
    status: 'crew_assigned',
    applicant: ellen,
    crew: tomasz,
    jurisdiction: 'marrow-county',
    ageDays: 34,
    site: steepLanding,
    permitReference: 'MC-DA-2026-0355',
    permitConditions: countyConditions,
    application: application({
      address: '12 Heronsgate Road, Marrow Crossing',
      roadName: 'Heronsgate Road',
      siteLat: 44.1987,
      siteLng: -72.5731,
      positionKind: 'coordinates',
    }),
  },
  {
    status: 'under_construction',
    applicant: sam,
    crew: jo,
    office: marcus,
    jurisdiction: 'marrow-county',
    ageDays: 40,
    site: hillside,
    permitReference: 'MC-DA-2026-0321',
    permitConditions: countyConditions,
    application: application(
      { address: '3187 Stonecrop Pike, Marrow Crossing', roadName: 'Stonecrop Pike', postedSpeedMph: 45 },
      { use: 'farm', vehicles: ['cars', 'trucks', 'trailers'] },
    ),
  },
  {
    status: 'built',
    applicant: ravi,
    crew: tomasz,
    jurisdiction: 'town-of-elderbrook',
    ageDays: 48,
    site: gentle,
    permitReference: 'EPW-2026-097',
    permitConditions: townConditions,
    application: application({
      address: '400 Larkspur Ridge Road, Elderbrook',
      roadName: 'Larkspur Ridge Road',
      roadOwner: 'town',
      postedSpeedMph: 30,
    }),
  },
  {
    status: 'closed',
    applicant: nora,
    crew: jo,
    jurisdiction: 'marrow-county',
    ageDays: 75,
    site: gentle,
    permitReference: 'MC-DA-2026-0230',
    permitConditions: countyConditions,
    application: application({ address: '18 Fernhill Road, Marrow Crossing', roadName: 'Fernhill Road' }),
  },
  {
    status: 'permit_refused',
    applicant: nora,
    jurisdiction: 'marrow-county',
    ageDays: 34,
    site: gentle,
    permitReference: 'MC-DA-2026-0377',
    application: application({
      address: '27 Kestrel Bend Road, Marrow Crossing',
      roadName: 'Kestrel Bend Road',
      postedSpeedMph: 50,
    }),
    notes: {
      permit_refused:
        'The county asks for the entrance 60 ft further north for sight distance; the owner has decided not to go ahead.',
    },
  },
  {
    status: 'declined',
    applicant: sam,
    office: marcus,
    jurisdiction: 'marrow-county',
    ageDays: 30,
    application: application({
      address: '6 Cutter Bridge Road, Marrow Crossing',
      roadName: 'Cutter Bridge Road',
      postedSpeedMph: 50,
    }),
    notes: {
      declined:
        'The entrance would sit 40 ft from the Cutter Bridge intersection; the county asks for 100 ft. We suggest the north end of the frontage instead: ask us for a new request there.',
    },
  },
  {
    status: 'withdrawn',
    applicant: ellen,
    jurisdiction: 'town-of-elderbrook',
    ageDays: 22,
    application: application({ address: '90 Wickham Lane, Elderbrook', roadName: 'Wickham Lane', roadOwner: 'town' }),
    notes: { withdrawn: 'We sold the lot.' },
  },
];
