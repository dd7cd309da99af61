import { afterAll, describe, expect, it } from 'vitest';
import { buildInputs } from '../../src/features/grade-check/lib/build-inputs';
import { parsePastedCentreline } from '../../src/features/grade-check/lib/paste-centreline';
import { initialSurvey, type SurveyState } from '../../src/features/grade-check/lib/survey-state';
import { surveyFromInputs } from '../../src/features/grade-check/lib/survey-from-inputs';
import { runLiveCheck, runLiveCheckWithProposal } from '../../src/features/grade-check/lib/use-live-check';
import { demoJurisdictions } from '../../server/dev/seed/jurisdictions';
import { closeDesignPool } from '../../server/services/design/design-pool';
import { parseGradeCheckInputs, runGradeCheck } from '../../server/services/grade-checks/run-grade-check';
import { proposeProfile, ruleProfileSchema } from '@shared/engine';

afterAll(() => closeDesignPool());

const marrow = {
  ...ruleProfileSchema.parse(demoJurisdictions[0].profile),
  id: 'v1',
  version: 1,
  jurisdictionName: 'Marrow County',
};

function survey(rows: string, patch: (s: SurveyState) => void = () => undefined): SurveyState {
  const s = initialSurvey(45);
  s.centreline.rows = parsePastedCentreline(rows);
  patch(s);
  return s;
}

describe('survey entry in the browser', () => {
  it('reads pasted rows with a header, commas or tabs, and keeps bad cells to show their errors', () => {
    const rows = parsePastedCentreline('Station,Elevation\n0+00, 100.00\n\n0+10\t100.55\n0+2O,101.1\n');
    expect(rows.map((r) => [r.station, r.value])).toEqual([
      ['0+00', '100.00'],
      ['0+10', '100.55'],
      ['0+2O', '101.1'],
    ]);
    const { inputs, errors } = buildInputs(survey('0+00,100\n0+1O,abc\n0+20,101.1'), marrow);
    expect(inputs).toBeUndefined();
    expect(errors['profile.points.1.stationFt']).toMatch(/not a station/);
    expect(errors['profile.points.1.elevationFt']).toMatch(/not a number/);
    expect(errors['profile.points.0.stationFt']).toBeUndefined();
  });

  it('turns rod readings and ditch depths into the elevations the engine checks', () => {
    const s = survey('0+00\t4.00\n0+20\t2.90\n0+60\t-1.90', (st) => {
      st.centreline.mode = 'rod-readings';
      st.centreline.instrumentHeightFt = '104.00';
      Object.assign(st.culvert, {
        present: true,
        inletDitchDepthFt: '2.0',
        outletDitchDepthFt: '2.3',
        surfaceElevationFt: '100.5',
        designFlowCfs: '4',
      });
    });
    const live = runLiveCheck(s, marrow);
    expect(live.errors).toEqual({});
    expect(live.results?.report.profile.points.map((p) => p.elevationFt)).toEqual([100, 101.1, 105.9]);
    expect(live.inputs?.culvert).toMatchObject({ inletInvertFt: 98, outletInvertFt: 97.7 });
  });

  it('gets exactly the results the server records from the same inputs', async () => {
    const s = survey('0+00\t100\n0+10\t100.55\n0+20\t101.1\n0+40\t103.5\n0+80\t108.3', (st) => {
      st.road.sightLeftFt = '650';
      st.road.sightRightFt = '600';
      st.design.proposed = true;
    });
    const live = await runLiveCheckWithProposal(s, marrow, proposeProfile);
    expect(live.results?.report.passes).toBe(false);
    const applied = await runLiveCheckWithProposal(
      { ...s, design: { ...s.design, applied: live.results!.proposal!.profile } },
      marrow,
      proposeProfile,
    );
    expect(applied.results?.report.passes).toBe(true);
    // The server runs the proposal in its worker threads; the answer is the same.
    const server = await runGradeCheck(parseGradeCheckInputs(JSON.parse(JSON.stringify(applied.inputs))), marrow);
    expect(JSON.parse(JSON.stringify(server))).toEqual(JSON.parse(JSON.stringify(applied.results)));
  });

  it('puts a saved check back in the form so a new survey starts from it', async () => {
    const s = survey('0+00\t4.00\n0+20\t2.90\n0+60\t-1.90', (st) => {
      st.centreline.mode = 'rod-readings';
      st.centreline.instrumentHeightFt = '104';
      st.road.gradePercent = '2.5';
      st.road.rises = 'left';
      st.laser.stakes = [{ key: 'a', label: 'CL 0+40', offsetFt: '0', distanceFt: '40', rodReadingFt: '5.5' }];
      Object.assign(st.culvert, {
        present: true,
        inletInvertFt: '98',
        outletInvertFt: '97.7',
        flow: 'rational',
        areaAcres: '2',
        runoffC: '0.3',
        intensityInPerHr: '4',
      });
      st.design.proposed = true;
    });
    const first = await runLiveCheckWithProposal(s, marrow, proposeProfile);
    const applied = { ...s, design: { ...s.design, applied: first.results!.proposal!.profile } };
    const { inputs } = buildInputs(applied, marrow);
    expect(buildInputs(surveyFromInputs(inputs!), marrow).inputs).toEqual(inputs);
  });
});
