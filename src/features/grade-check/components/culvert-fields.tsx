import { inletTypes } from '@shared/engine';
import { type FieldErrors, withLabel } from '../lib/read-number';
import type { SurveyState } from '../lib/survey-state';
import { ChoiceBox, NumberBox } from './number-box';

type Culvert = SurveyState['culvert'];

const TAILWATER = 'Tailwater depth in the outlet ditch (ft)';

const inletWords: Record<(typeof inletTypes)[number], string> = {
  'concrete-square-headwall': 'Concrete, square edge with headwall',
  'concrete-groove-headwall': 'Concrete, groove end with headwall',
  'concrete-groove-projecting': 'Concrete, groove end projecting',
  'cmp-headwall': 'Corrugated metal with headwall',
  'cmp-mitered': 'Corrugated metal mitred to the slope',
  'cmp-projecting': 'Corrugated metal projecting',
};

/** Pipe material sets Manning's n; the common ones are offered, any other can be typed. */
const materials = [
  ['0.024', 'Corrugated metal (n 0.024)'],
  ['0.012', 'Smooth plastic or HDPE (n 0.012)'],
  ['0.013', 'Concrete (n 0.013)'],
] as const;

export function CulvertFields({
  culvert,
  errors,
  onChange,
}: {
  culvert: Culvert;
  errors: FieldErrors;
  onChange: (patch: Partial<Culvert>) => void;
}) {
  const e = (key: string) => errors[`culvert.${key}`];
  return (
    <div className="space-y-4">
      <label className="flex items-center gap-2 text-sm font-semibold">
        <input type="checkbox" checked={culvert.present} onChange={(ev) => onChange({ present: ev.target.checked })} />
        There is a ditch: the entrance needs a culvert
      </label>
      {culvert.present && (
        <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          <NumberBox
            label="Diameter (in)"
            value={culvert.diameterIn}
            error={e('diameterIn')}
            onChange={(diameterIn) => onChange({ diameterIn })}
          />
          <ChoiceBox
            label="Inlet"
            value={culvert.inlet as (typeof inletTypes)[number]}
            options={inletTypes.map((t) => [t, inletWords[t]] as const)}
            onChange={(inlet) => onChange({ inlet })}
          />
          <ChoiceBox
            label="Pipe material"
            value={materials.some(([n]) => n === culvert.manningN) ? culvert.manningN : 'other'}
            options={[...materials, ['other', 'Other (type n)']]}
            onChange={(n) => onChange({ manningN: n === 'other' ? '' : n })}
          />
          <NumberBox
            label="Manning's n"
            value={culvert.manningN}
            error={e('manningN')}
            onChange={(manningN) => onChange({ manningN })}
          />
          <NumberBox
            label="Flowline (invert) at the inlet (ft)"
            value={culvert.inletInvertFt}
            error={e('inletInvertFt')}
            onChange={(inletInvertFt) => onChange({ inletInvertFt })}
          />
          <NumberBox
            label="or ditch depth at the inlet (ft)"
            hint="Below the road edge; used when the flowline is blank"
            value={culvert.inletDitchDepthFt}
            onChange={(inletDitchDepthFt) => onChange({ inletDitchDepthFt })}
          />
          <NumberBox
            label="Flowline (invert) at the outlet (ft)"
            value={culvert.outletInvertFt}
            error={e('outletInvertFt')}
            onChange={(outletInvertFt) => onChange({ outletInvertFt })}
          />
          <NumberBox
            label="or ditch depth at the outlet (ft)"
            hint="Below the road edge; used when the flowline is blank"
            value={culvert.outletDitchDepthFt}
            onChange={(outletDitchDepthFt) => onChange({ outletDitchDepthFt })}
          />
          <NumberBox
            label={TAILWATER}
            hint="Water standing above the outlet invert at the design flow; blank: a free outlet"
            value={culvert.tailwaterDepthFt}
            error={withLabel(TAILWATER, e('tailwaterDepthFt'))}
            onChange={(tailwaterDepthFt) => onChange({ tailwaterDepthFt })}
          />
          <NumberBox
            label="Driveway surface over the pipe (ft)"
            hint="Sets the cover and the pipe length"
            value={culvert.surfaceElevationFt}
            error={e('surfaceElevationFt')}
            onChange={(surfaceElevationFt) => onChange({ surfaceElevationFt })}
          />
          <NumberBox
            label="Pipe length (ft)"
            hint="Blank: the check says what length to order"
            value={culvert.lengthFt}
            error={e('lengthFt')}
            onChange={(lengthFt) => onChange({ lengthFt })}
          />
          <ChoiceBox
            label="Flow"
            value={culvert.flow}
            options={[
              ['design', 'Design flow given'],
              ['rational', 'From the drainage area (rational method)'],
            ]}
            onChange={(flow) => onChange({ flow })}
          />
          {culvert.flow === 'design' ? (
            <NumberBox
              label="Design flow (cfs)"
              value={culvert.designFlowCfs}
              error={e('designFlowCfs')}
              onChange={(designFlowCfs) => onChange({ designFlowCfs })}
            />
          ) : (
            <>
              <NumberBox
                label="Drainage area (acres)"
                value={culvert.areaAcres}
                error={e('drainage.areaAcres')}
                onChange={(areaAcres) => onChange({ areaAcres })}
              />
              <NumberBox
                label="Runoff coefficient C"
                value={culvert.runoffC}
                error={e('drainage.runoffC')}
                onChange={(runoffC) => onChange({ runoffC })}
              />
              <NumberBox
                label="Rainfall intensity (in/hr)"
                value={culvert.intensityInPerHr}
                error={e('drainage.intensityInPerHr')}
                onChange={(intensityInPerHr) => onChange({ intensityInPerHr })}
              />
            </>
          )}
        </div>
      )}
    </div>
  );
}
