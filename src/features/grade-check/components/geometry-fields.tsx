import type { FieldErrors } from '../lib/read-number';
import type { SurveyState } from '../lib/survey-state';
import { NumberBox } from './number-box';

type Geometry = SurveyState['geometry'];

export function GeometryFields({
  geometry,
  errors,
  onChange,
}: {
  geometry: Geometry;
  errors: FieldErrors;
  onChange: (patch: Partial<Geometry>) => void;
}) {
  return (
    <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
      <NumberBox
        label="Top width (ft)"
        value={geometry.topWidthFt}
        error={errors['geometry.widthFt'] ?? errors['design.template.topWidthFt'] ?? errors['apron.entranceWidthFt']}
        onChange={(topWidthFt) => onChange({ topWidthFt })}
      />
      <NumberBox
        label="Side slopes (H:V, e.g. 2 for 2:1)"
        value={geometry.sideSlopeHPerV}
        error={errors['design.template.cutSlopeHPerV']}
        onChange={(sideSlopeHPerV) => onChange({ sideSlopeHPerV })}
      />
      <NumberBox
        label="Flare radius (ft)"
        value={geometry.flareRadiusFt}
        error={errors['geometry.flareRadiusFt']}
        onChange={(flareRadiusFt) => onChange({ flareRadiusFt })}
      />
      <NumberBox
        label="To the nearest intersection (ft)"
        value={geometry.distanceToIntersectionFt}
        error={errors['geometry.distanceToIntersectionFt']}
        onChange={(distanceToIntersectionFt) => onChange({ distanceToIntersectionFt })}
      />
      <NumberBox
        label="To the property line (ft)"
        value={geometry.distanceToPropertyLineFt}
        error={errors['geometry.distanceToPropertyLineFt']}
        onChange={(distanceToPropertyLineFt) => onChange({ distanceToPropertyLineFt })}
      />
    </div>
  );
}
