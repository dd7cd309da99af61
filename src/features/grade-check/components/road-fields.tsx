import { type FieldErrors, withLabel } from '../lib/read-number';
import type { SurveyState } from '../lib/survey-state';
import { ChoiceBox, NumberBox } from './number-box';

type Road = SurveyState['road'];

const CROSS = 'Road cross slope (%)';
const SHOULDER_WIDTH = 'Shoulder width (ft)';
const SHOULDER_SLOPE = 'Shoulder slope (%)';

export function RoadFields({
  road,
  errors,
  onChange,
}: {
  road: Road;
  errors: FieldErrors;
  onChange: (patch: Partial<Road>) => void;
}) {
  return (
    <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
      <NumberBox
        label="Road grade at the entrance (%)"
        value={road.gradePercent}
        error={errors['road.gradePercent']}
        onChange={(gradePercent) => onChange({ gradePercent })}
      />
      <ChoiceBox
        label="Facing into the property, the road"
        value={road.rises}
        options={[
          ['right', 'rises to the right'],
          ['left', 'rises to the left'],
        ]}
        onChange={(rises) => onChange({ rises })}
      />
      <NumberBox
        label="Road-edge elevation (ft)"
        hint="Blank: taken from the centreline at the road edge"
        value={road.edgeElevationFt}
        error={errors['road.edgeElevationFt'] ?? errors['design.roadEdgeElevationFt']}
        onChange={(edgeElevationFt) => onChange({ edgeElevationFt })}
      />
      <NumberBox
        label="Road edge at station"
        value={road.edgeStation}
        error={errors.roadEdgeStationFt}
        onChange={(edgeStation) => onChange({ edgeStation })}
      />
      <NumberBox
        label={CROSS}
        hint="+ falls toward the road edge (a normal crown); blank: the break at the road edge is not checked"
        value={road.crossSlopePercent}
        error={withLabel(CROSS, errors['roadSide.roadCrossSlopePercent'])}
        onChange={(crossSlopePercent) => onChange({ crossSlopePercent })}
      />
      <NumberBox
        label={SHOULDER_WIDTH}
        hint="Blank or 0: no shoulder; the landing starts at the shoulder's outer edge"
        value={road.shoulderWidthFt}
        error={withLabel(SHOULDER_WIDTH, errors['roadSide.shoulderWidthFt'])}
        onChange={(shoulderWidthFt) => onChange({ shoulderWidthFt })}
      />
      <NumberBox
        label={SHOULDER_SLOPE}
        hint="+ falls toward the road edge"
        value={road.shoulderSlopePercent}
        error={withLabel(SHOULDER_SLOPE, errors['roadSide.shoulderSlopePercent'])}
        onChange={(shoulderSlopePercent) => onChange({ shoulderSlopePercent })}
      />
      <NumberBox
        label="Posted or design speed (mph)"
        value={road.speedMph}
        error={errors['sight.speedMph']}
        onChange={(speedMph) => onChange({ speedMph })}
      />
      <NumberBox
        label="Sight distance measured left (ft)"
        value={road.sightLeftFt}
        error={errors['sight.measuredLeftFt']}
        onChange={(sightLeftFt) => onChange({ sightLeftFt })}
      />
      <NumberBox
        label="Sight distance measured right (ft)"
        value={road.sightRightFt}
        error={errors['sight.measuredRightFt']}
        onChange={(sightRightFt) => onChange({ sightRightFt })}
      />
      <ChoiceBox
        label="Turns out of the driveway"
        value={road.movements}
        options={[
          ['all', 'left and right'],
          ['right-only', 'right turns only'],
        ]}
        onChange={(movements) => onChange({ movements })}
      />
    </div>
  );
}
