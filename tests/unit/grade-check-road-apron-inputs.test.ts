import { describe, expect, it } from 'vitest';
import { commonRuralTemplate } from '@shared/engine';
import { buildInputs } from '../../src/features/grade-check/lib/build-inputs';
import { initialSurvey, newKey, type SurveyState } from '../../src/features/grade-check/lib/survey-state';
import { surveyFromInputs } from '../../src/features/grade-check/lib/survey-from-inputs';
import { runLiveCheck } from '../../src/features/grade-check/lib/use-live-check';

function survey(patch: (s: SurveyState) => void): SurveyState {
  const s = initialSurvey(45);
  s.centreline.rows = [
    ['0+00', '100'],
    ['0+20', '100.8'],
    ['0+50', '104'],
  ].map(([station, value]) => ({ key: newKey(), station, value }));
  s.road.gradePercent = '1.5';
  patch(s);
  return s;
}

describe('the road side and the apron as typed on the grade check screen', () => {
  it('a blank road cross slope leaves the road side out, so the engine says the break was not checked', () => {
    const { inputs, errors } = buildInputs(
      survey(() => {}),
      commonRuralTemplate,
    );
    expect(errors).toEqual({});
    expect(inputs?.roadSide).toBeUndefined();
    expect(inputs?.apron).toBeUndefined();
  });

  it('a shoulder width with no slope marks the shoulder slope box, and no cross slope marks the cross slope box', () => {
    const { errors } = buildInputs(
      survey((s) => {
        s.road.shoulderWidthFt = '3';
      }),
      commonRuralTemplate,
    );
    expect(errors['roadSide.shoulderSlopePercent']).toBe('give the shoulder slope for a shoulder this wide');
    expect(errors['roadSide.roadCrossSlopePercent']).toBe('give the road cross slope with the shoulder');
  });

  it('the apron takes the signed road grade, and the driveway laser setup takes the cross slope the warp ends on', () => {
    const { inputs, errors } = buildInputs(
      survey((s) => {
        s.road.rises = 'left';
        s.road.crossSlopePercent = '2';
        s.apron = { checked: true, drivewayCrossSlopePercent: '1', warpLengthFt: '', stakeIntervalFt: '5' };
      }),
      commonRuralTemplate,
    );
    expect(errors).toEqual({});
    expect(inputs?.roadSide).toEqual({
      roadCrossSlopePercent: 2,
      shoulderWidthFt: undefined,
      shoulderSlopePercent: undefined,
    });
    expect(inputs?.apron).toEqual({
      roadGradePercent: -1.5,
      drivewayCrossSlopePercent: 1,
      warpLengthFt: undefined,
      stakeIntervalFt: 5,
    });
    expect(inputs?.laser?.drivewayCrossSlopePercent).toBe(1);
  });

  it('an apron with no top width to place its edges marks the top width box', () => {
    const { errors } = buildInputs(
      survey((s) => {
        s.apron.checked = true;
        s.geometry.topWidthFt = '';
      }),
      commonRuralTemplate,
    );
    expect(errors['geometry.widthFt']).toBe('give the top width to place the edges of the entrance');
  });

  it('a saved check comes back into the same boxes, the tailwater and the apron included', () => {
    const typed = survey((s) => {
      s.road.crossSlopePercent = '2';
      s.road.shoulderWidthFt = '4';
      s.road.shoulderSlopePercent = '6';
      s.apron = { checked: true, drivewayCrossSlopePercent: '0.5', warpLengthFt: '15', stakeIntervalFt: '5' };
      Object.assign(s.culvert, {
        present: true,
        inletInvertFt: '98',
        outletInvertFt: '97.7',
        designFlowCfs: '4',
        tailwaterDepthFt: '0.6',
      });
    });
    const back = surveyFromInputs(buildInputs(typed, commonRuralTemplate).inputs!);
    expect(back.road).toMatchObject({ crossSlopePercent: '2', shoulderWidthFt: '4', shoulderSlopePercent: '6' });
    expect(back.apron).toEqual(typed.apron);
    expect(back.culvert.tailwaterDepthFt).toBe('0.6');
  });
});

describe('the live check with a design part the server would refuse', () => {
  it('marks the side slopes box and still checks the entrance, but cannot be saved', () => {
    const live = runLiveCheck(
      survey((s) => {
        s.road.edgeElevationFt = '100';
        s.geometry.sideSlopeHPerV = '-2';
      }),
      commonRuralTemplate,
    );
    expect(live.errors['design.template.cutSlopeHPerV']).toBeDefined();
    expect(Object.keys(live.errors).every((field) => field.startsWith('design.template.'))).toBe(true);
    expect(live.results?.report.profile.points).toHaveLength(3);
    expect(live.ready).toBe(false);
  });
});
