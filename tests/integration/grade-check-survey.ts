import { PDFParse } from 'pdf-parse';
import { eq } from 'drizzle-orm';
import type { DbOrTx } from '../../server/db/client';
import { jurisdictions } from '../../server/db/schema';
import { seedJurisdictions } from '../../server/dev/seed/jurisdictions';

/**
 * An invented site: a 5.5% landing, then 12% up to the house. Marrow County's 4% landing limit fails it;
 * the Town of Elderbrook's 6% limit passes it. The culvert, sight and geometry figures pass under both.
 */
export const groundPoints = [
  { stationFt: 0, elevationFt: 100 },
  { stationFt: 10, elevationFt: 100.55 },
  { stationFt: 20, elevationFt: 101.1 },
  { stationFt: 40, elevationFt: 103.5 },
  { stationFt: 60, elevationFt: 105.9 },
  { stationFt: 80, elevationFt: 108.3 },
];

export function surveyInputs(overrides: Record<string, unknown> = {}) {
  return {
    profile: { kind: 'elevations', points: groundPoints },
    roadEdgeStationFt: 0,
    culvert: {
      diameterIn: 18,
      inlet: 'cmp-projecting',
      manningN: 0.024,
      inletInvertFt: 98,
      outletInvertFt: 97.7,
      surfaceElevationFt: 100.5,
      lengthFt: 30,
      topWidthFt: 16,
      sideSlopeHPerV: 2,
      designFlowCfs: 4,
    },
    sight: { speedMph: 45, measuredLeftFt: 650, measuredRightFt: 600 },
    geometry: { widthFt: 16, flareRadiusFt: 12, distanceToIntersectionFt: 300, distanceToPropertyLineFt: 20 },
    road: { gradePercent: 1.5, edgeElevationFt: 100 },
    laser: {
      originElevationFt: 100,
      roadGradePercent: 1.5,
      landingGradePercent: 5.5,
      landingLengthFt: 20,
      drivewayGradePercent: 12,
      receiverOffsetFt: 6,
      stakes: [{ label: 'CL 0+40', offsetFt: 0, distanceFt: 40, rodReadingFt: 5.4 }],
    },
    design: { existing: { kind: 'elevations', points: groundPoints }, roadEdgeElevationFt: 100, applied: false },
    ...overrides,
  };
}

/** The demo authority's current version, seeding the two demo authorities first if this database has none. */
export async function currentVersionId(db: DbOrTx, slug: 'marrow-county' | 'town-of-elderbrook') {
  await seedJurisdictions(db);
  const [row] = await db
    .select({ id: jurisdictions.currentVersionId })
    .from(jurisdictions)
    .where(eq(jurisdictions.slug, slug));
  if (!row?.id) throw new Error(`${slug} has no current version`);
  return row.id;
}

/** A PDF's text with its runs of white space made one space, so a test can look for a sentence across lines. */
export async function pdfText(bytes: Buffer) {
  const parser = new PDFParse({ data: bytes });
  try {
    return (await parser.getText()).text.replace(/\s+/g, ' ');
  } finally {
    await parser.destroy();
  }
}
