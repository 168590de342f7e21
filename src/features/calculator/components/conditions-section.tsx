import { assessConditions, surfaceMarginWords, type ConditionsAssessment } from '../../../../shared/finishing/conditions';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { formatQuantity, unitSymbol } from '../../../../shared/units';
import { CalculatorSection, FieldGrid, InfoBadge, ResultItem, Results, VerdictBadge } from './calculator-output';
import { attempt, fieldErrors, readNumber, readOptionalSi, readSi, startText } from './calculator-values';
import { NumberField } from './number-field';
import { useTextFields } from './use-text-fields';

const limitHint = 'From the data sheet; leave blank for general limits.';

/** Air, humidity and part temperature in; dew point, margin and a go / caution / stop out. */
export function ConditionsSection({ units }: { units: UnitSystem }) {
  const { values, change } = useTextFields(() => ({
    air: startText(20, 'temperature', units),
    humidity: '55',
    surface: startText(19, 'temperature', units),
    minTemp: '',
    maxHumidity: '',
  }));
  const degrees = unitSymbol('temperature', units);
  const outcome = attempt(() =>
    assessConditions({
      airTempC: readSi(values.air, 'temperature', units),
      relativeHumidityPct: readNumber(values.humidity),
      surfaceTempC: readSi(values.surface, 'temperature', units),
      minApplicationTempC: readOptionalSi(values.minTemp, 'temperature', units),
      maxRelativeHumidityPct: readOptionalSi(values.maxHumidity, null, units),
      units,
    }),
  );
  const errors = fieldErrors(outcome);

  return (
    <CalculatorSection title="Spraying conditions" intro="Measure the air and the part itself: cold stock is the usual cause of condensation.">
      <FieldGrid>
        <NumberField label="Air temperature" unit={degrees} value={values.air} onChange={change('air')} error={errors.airTempC} />
        <NumberField label="Relative humidity" unit="%" value={values.humidity} onChange={change('humidity')} error={errors.relativeHumidityPct} />
        <NumberField label="Surface temperature of the part" unit={degrees} value={values.surface} onChange={change('surface')} error={errors.surfaceTempC} />
        <NumberField label="Product's minimum temperature" unit={degrees} value={values.minTemp} onChange={change('minTemp')} hint={limitHint} error={errors.minApplicationTempC} />
        <NumberField label="Product's maximum humidity" unit="%" value={values.maxHumidity} onChange={change('maxHumidity')} hint={limitHint} error={errors.maxRelativeHumidityPct} />
      </FieldGrid>
      {outcome.ok ? (
        <ConditionsResult result={outcome.value} units={units} />
      ) : (
        <p className="rounded-panel bg-maple-50 p-4 text-maple-700">Fill in the boxes to see the dew point and verdict.</p>
      )}
    </CalculatorSection>
  );
}

const verdictWords = { go: 'Go: fit to spray', caution: 'Caution: spray with care', stop: 'Stop: do not spray' } as const;

function ConditionsResult({ result, units }: { result: ConditionsAssessment; units: UnitSystem }) {
  return (
    <div className="space-y-4">
      <Results label="Conditions result">
        <ResultItem term="Dew point">{formatQuantity(result.dewPointC, 'temperature', units)}</ResultItem>
        <ResultItem term="Surface against dew point">{surfaceMarginWords(result.surfaceMarginC, units)}</ResultItem>
        <ResultItem term="Verdict">
          <VerdictBadge verdict={result.verdict} label={verdictWords[result.verdict]} />
        </ResultItem>
      </Results>
      <ul className="space-y-2">
        {result.checks.map((check) => (
          <li key={check.code} className="flex items-start gap-3">
            {check.info ? <InfoBadge /> : <VerdictBadge verdict={check.verdict} />}
            <span className="pt-2">{check.message}</span>
          </li>
        ))}
      </ul>
    </div>
  );
}
