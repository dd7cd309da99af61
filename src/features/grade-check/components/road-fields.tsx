import type { FieldErrors } from '../lib/read-number';
import type { SurveyState } from '../lib/survey-state';
import { ChoiceBox, NumberBox } from './number-box';

type Road = SurveyState['road'];

export function RoadFields({ road, errors, onChange }: { road: Road; errors: FieldErrors; onChange: (patch: Partial<Road>) => void }) {
  return (
    <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
      <NumberBox label="Road grade at the entrance (%)" value={road.gradePercent} error={errors['road.gradePercent']} onChange={(gradePercent) => onChange({ gradePercent })} />
      <ChoiceBox label="Facing into the property, the road" value={road.rises} options={[['right', 'rises to the right'], ['left', 'rises to the left']]} onChange={(rises) => onChange({ rises })} />
      <NumberBox label="Road-edge elevation (ft)" hint="Blank: taken from the centreline at the road edge" value={road.edgeElevationFt} error={errors['road.edgeElevationFt'] ?? errors['design.roadEdgeElevationFt']} onChange={(edgeElevationFt) => onChange({ edgeElevationFt })} />
      <NumberBox label="Road edge at station" value={road.edgeStation} error={errors.roadEdgeStationFt} onChange={(edgeStation) => onChange({ edgeStation })} />
      <NumberBox label="Road cross slope (%)" value={road.crossSlopePercent} error={errors['road.crossSlopePercent']} onChange={(crossSlopePercent) => onChange({ crossSlopePercent })} />
      <NumberBox label="Posted or design speed (mph)" value={road.speedMph} error={errors['sight.speedMph']} onChange={(speedMph) => onChange({ speedMph })} />
      <NumberBox label="Sight distance measured left (ft)" value={road.sightLeftFt} error={errors['sight.measuredLeftFt']} onChange={(sightLeftFt) => onChange({ sightLeftFt })} />
      <NumberBox label="Sight distance measured right (ft)" value={road.sightRightFt} error={errors['sight.measuredRightFt']} onChange={(sightRightFt) => onChange({ sightRightFt })} />
      <ChoiceBox label="Turns out of the driveway" value={road.movements} options={[['all', 'left and right'], ['right-only', 'right turns only']]} onChange={(movements) => onChange({ movements })} />
    </div>
  );
}
