import type { Booth } from '../../../../shared/schemas/booth';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { formatQuantity, unitSymbol } from '../../../../shared/units';
import { FieldGrid } from './calculator-output';
import { formatMinutes } from './calculator-values';
import { NumberField } from './number-field';

export type TypedBooth = { volume: string; extraction: string; mixing: string; faceArea: string };

type TypedBoothFieldsProps = {
  values: TypedBooth;
  change: (key: keyof TypedBooth) => (text: string) => void;
  units: UnitSystem;
  errors: Record<string, string>;
};

/** Booth figures typed in, for a booth not set up in Boothwright or to try "what if". */
export function TypedBoothFields({ values, change, units, errors }: TypedBoothFieldsProps) {
  return (
    <FieldGrid>
      <NumberField label="Booth volume" unit={unitSymbol('roomVolume', units)} value={values.volume} onChange={change('volume')} error={errors.volumeM3} />
      <NumberField label="Extraction rate" unit={unitSymbol('airflow', units)} value={values.extraction} onChange={change('extraction')} error={errors.extractionM3PerH} />
      <NumberField label="Mixing factor K" value={values.mixing} onChange={change('mixing')} hint="1 = perfectly mixed; 3 suits most booths." error={errors.mixingFactorK} />
      <NumberField
        label="Open-face area"
        unit={unitSymbol('area', units)}
        value={values.faceArea}
        onChange={change('faceArea')}
        hint="Optional, for face velocity."
        error={errors.openFaceAreaM2}
      />
    </FieldGrid>
  );
}

/** A set-up booth's own figures, shown rather than edited here. */
export function BoothFigures({ booth, units }: { booth: Booth; units: UnitSystem }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-maple-800">
      <dt>Volume</dt>
      <dd>{formatQuantity(booth.volumeM3, 'roomVolume', units)}</dd>
      <dt>Extraction</dt>
      <dd>{formatQuantity(booth.extractionM3PerH, 'airflow', units)}</dd>
      <dt>Mixing factor K</dt>
      <dd>{booth.mixingFactorK}</dd>
      <dt>Measured clearance</dt>
      <dd>{booth.measuredClearanceMin === null ? 'Not measured yet' : formatMinutes(booth.measuredClearanceMin)}</dd>
    </dl>
  );
}
