import { Controller, type Control, type FieldErrors } from 'react-hook-form';
import type { z } from 'zod';
import type { RespiratorLevel } from '../../../../shared/finishing/cautions';
import type { checklistSchema } from '../../../../shared/schemas/checklist';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { formatQuantity } from '../../../../shared/units';
import { RespiratorChoice } from './respirator-choice';
import { StepperField } from './stepper-field';
import { ToggleField } from './toggle-field';

export type ChecklistInput = z.input<typeof checklistSchema>;

interface ChecklistFieldsProps {
  control: Control<ChecklistInput>;
  errors: FieldErrors<ChecklistInput>;
  units: UnitSystem;
  minFaceVelocityMps: number;
  neededRespirator: RespiratorLevel | null;
}

export function EquipmentChecks({ control, errors, units, minFaceVelocityMps, neededRespirator }: ChecklistFieldsProps) {
  return (
    <div className="space-y-3">
      <Controller control={control} name="extractionRunning" render={({ field }) => <ToggleField label="Extraction is running" checked={field.value} onChange={field.onChange} />} />
      <Controller
        control={control}
        name="filtersChecked"
        render={({ field }) => <ToggleField label="Filters checked" hint="In place, not torn, not loaded with overspray." checked={field.value} onChange={field.onChange} />}
      />
      <Controller
        control={control}
        name="faceVelocityMps"
        render={({ field }) => (
          <StepperField
            label="Face velocity measured"
            quantity="airSpeed"
            units={units}
            step={units === 'us' ? 5 : 0.05}
            min={0}
            value={field.value}
            onChange={field.onChange}
            hint={`At the open face, with the anemometer. This booth needs at least ${formatQuantity(minFaceVelocityMps, 'airSpeed', units)}.`}
            error={errors.faceVelocityMps?.message}
          />
        )}
      />
      <Controller
        control={control}
        name="respiratorKind"
        render={({ field }) => <RespiratorChoice value={field.value} onChange={field.onChange} needed={neededRespirator} error={errors.respiratorKind?.message} />}
      />
      <Controller
        control={control}
        name="respiratorFitted"
        render={({ field }) => <ToggleField label="Respirator fitted and checked" hint="Seal or air supply checked, filters in date." checked={field.value} onChange={field.onChange} />}
      />
    </div>
  );
}

export function ConditionFields({ control, errors, units }: Omit<ChecklistFieldsProps, 'minFaceVelocityMps' | 'neededRespirator'>) {
  return (
    <div className="grid gap-4 md:grid-cols-3">
      <Controller
        control={control}
        name="airTempC"
        render={({ field }) => (
          <StepperField label="Air temperature" quantity="temperature" units={units} step={units === 'us' ? 1 : 0.5} value={field.value} onChange={field.onChange} error={errors.airTempC?.message} />
        )}
      />
      <Controller
        control={control}
        name="relativeHumidityPct"
        render={({ field }) => (
          <StepperField label="Relative humidity" unit="%" units={units} step={1} min={1} max={100} digits={0} value={field.value} onChange={field.onChange} error={errors.relativeHumidityPct?.message} />
        )}
      />
      <Controller
        control={control}
        name="surfaceTempC"
        render={({ field }) => (
          <StepperField
            label="Surface temperature"
            quantity="temperature"
            units={units}
            step={units === 'us' ? 1 : 0.5}
            value={field.value}
            onChange={field.onChange}
            hint="Of the parts themselves: cold stock is the usual cause of condensation."
            error={errors.surfaceTempC?.message}
          />
        )}
      />
    </div>
  );
}
