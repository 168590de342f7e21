import { useState } from 'react';
import { effectiveClearance, faceVelocityMps } from '../../../../shared/finishing/booth-air';
import type { Booth } from '../../../../shared/schemas/booth';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { formatQuantity } from '../../../../shared/units';
import { CalculatorSection, ResultItem, Results, VerdictBadge } from './calculator-output';
import { attempt, fieldErrors, formatMinutes, readNumber, readOptionalSi, readSi, startText } from './calculator-values';
import { BoothFigures, TypedBoothFields, type TypedBooth } from './clearance-inputs';
import { ChoiceField } from './number-field';
import { useTextFields } from './use-text-fields';

const typed = 'typed';

type AirInput = Pick<Booth, 'volumeM3' | 'extractionM3PerH' | 'mixingFactorK' | 'measuredClearanceMin' | 'openFaceAreaM2'> & {
  minFaceVelocityMps: number | null;
};

function typedAir(values: TypedBooth, units: UnitSystem): AirInput {
  return {
    volumeM3: readSi(values.volume, 'roomVolume', units),
    extractionM3PerH: readSi(values.extraction, 'airflow', units),
    mixingFactorK: readNumber(values.mixing),
    measuredClearanceMin: null,
    openFaceAreaM2: readOptionalSi(values.faceArea, 'area', units),
    minFaceVelocityMps: null,
  };
}

/** How long to wait after spraying before the air is clear, for a chosen booth or typed-in figures. */
export function ClearanceSection({ units, booths }: { units: UnitSystem; booths: Booth[] }) {
  const [choice, setChoice] = useState(booths.length > 0 ? String(booths[0].id) : typed);
  const { values, change } = useTextFields<keyof TypedBooth>(() => ({
    volume: startText(72, 'roomVolume', units),
    extraction: startText(17280, 'airflow', units),
    mixing: '3',
    faceArea: '',
  }));
  const booth = booths.find((b) => String(b.id) === choice);
  const options = [...booths.map((b) => ({ value: String(b.id), label: b.name })), { value: typed, label: 'Type in the figures' }];
  const air: AirInput = booth ?? typedAir(values, units);
  const clearance = attempt(() => effectiveClearance(air));
  const face = attempt(() => (air.openFaceAreaM2 === null ? null : faceVelocityMps({ extractionM3PerH: air.extractionM3PerH, openFaceAreaM2: air.openFaceAreaM2 })));

  return (
    <CalculatorSection title="Booth clearance" intro="Time for the air to fall to 1 % of its vapour once spraying stops.">
      <div className="space-y-4">
        <ChoiceField label="Booth" value={choice} onChange={setChoice} options={options} />
        {booth ? <BoothFigures booth={booth} units={units} /> : <TypedBoothFields values={values} change={change} units={units} errors={fieldErrors(clearance, face)} />}
      </div>
      <Results label="Clearance result">
        <ResultItem term="Wait after spraying">{clearance.ok ? formatMinutes(clearance.value.minutes) : '—'}</ResultItem>
        <ResultItem term="Where the time comes from">{clearance.ok ? sourceWords[clearance.value.source] : '—'}</ResultItem>
        <ResultItem term="Face velocity">
          {face.ok && face.value !== null ? <FaceVelocity mps={face.value} minimum={air.minFaceVelocityMps} units={units} /> : '—'}
        </ResultItem>
      </Results>
    </CalculatorSection>
  );
}

const sourceWords = {
  measured: 'Measured in a smoke test of this booth.',
  computed: 'Calculated for well-mixed air: a lower bound. Have the booth smoke-tested and use the measured time.',
} as const;

function FaceVelocity({ mps, minimum, units }: { mps: number; minimum: number | null; units: UnitSystem }) {
  const shown = formatQuantity(mps, 'airSpeed', units);
  if (minimum === null) return <>{shown}</>;
  const meets = mps >= minimum;
  const words = `${shown}: ${meets ? 'meets' : 'below'} the ${formatQuantity(minimum, 'airSpeed', units)} minimum`;
  return <VerdictBadge verdict={meets ? 'go' : 'stop'} label={words} />;
}
