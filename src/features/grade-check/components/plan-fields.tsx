import { culvertMaterials } from '@shared/contracts/grade-checks';
import { Field, TextInput } from '@/components/ui/field';
import type { FieldErrors } from '../lib/read-number';
import type { SurveyState } from '../lib/survey-state';
import { ChoiceBox, NumberBox } from './number-box';

type Plan = SurveyState['plan'];
const sides = [
  ['', 'not given'],
  ['left', 'to the left'],
  ['right', 'to the right'],
] as const;

/** What the plan view and the permit packet draw besides the check's own measurements; every box may stay blank. */
export function PlanFields({
  plan,
  errors,
  onChange,
}: {
  plan: Plan;
  errors: FieldErrors;
  onChange: (patch: Partial<Plan>) => void;
}) {
  return (
    <div className="space-y-3">
      <p className="text-sm text-stone-600">
        For the plan view only; no finding depends on these. Left and right are facing into the property.
      </p>
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        <NumberBox
          label="Right-of-way line from the road edge (ft)"
          hint="Measured along the driveway"
          value={plan.rightOfWayFt}
          error={errors['plan.rightOfWayFt']}
          onChange={(rightOfWayFt) => onChange({ rightOfWayFt })}
        />
        <NumberBox
          label="Road width (ft)"
          value={plan.roadWidthFt}
          error={errors['plan.roadWidthFt']}
          onChange={(roadWidthFt) => onChange({ roadWidthFt })}
        />
        <NumberBox
          label="Driveway bearing (degrees from north)"
          hint="The direction the driveway runs into the property; blank: no north arrow"
          value={plan.bearingDeg}
          error={errors['plan.bearingDeg']}
          onChange={(bearingDeg) => onChange({ bearingDeg })}
        />
        <ChoiceBox
          label="Nearest intersection lies"
          value={plan.intersectionSide}
          options={sides}
          onChange={(intersectionSide) => onChange({ intersectionSide })}
        />
        <Field label="Intersecting road's name" error={errors['plan.intersectionName']}>
          {({ id, describedBy, invalid }) => (
            <TextInput
              id={id}
              value={plan.intersectionName}
              aria-describedby={describedBy}
              aria-invalid={invalid}
              onChange={(e) => onChange({ intersectionName: e.target.value })}
            />
          )}
        </Field>
        <ChoiceBox
          label="Side property line lies"
          value={plan.propertyLineSide}
          options={sides}
          onChange={(propertyLineSide) => onChange({ propertyLineSide })}
        />
        <NumberBox
          label="Culvert at station"
          hint="Blank: drawn at the lowest shot near the road edge"
          value={plan.culvertStation}
          error={errors['plan.culvertStationFt']}
          onChange={(culvertStation) => onChange({ culvertStation })}
        />
        <ChoiceBox
          label="Culvert material"
          value={plan.culvertMaterial}
          options={[['', 'as the inlet type says'], ...culvertMaterials.map((m) => [m, m] as const)]}
          onChange={(culvertMaterial) => onChange({ culvertMaterial })}
        />
      </div>
    </div>
  );
}
