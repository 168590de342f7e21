import { mixQuantities, type MixInput } from '../../../../shared/finishing/material';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { displayDigits, formatQuantity, unitSymbol, usGallonsToLitres } from '../../../../shared/units';
import { CalculatorSection, FieldGrid, ResultItem, Results } from './calculator-output';
import { attempt, fieldErrors, readNumber, readSi, startText } from './calculator-values';
import { ChoiceField, NumberField } from './number-field';
import { useTextFields } from './use-text-fields';

const basisOptions = [
  { value: 'on-mix', label: 'Base and hardener together' },
  { value: 'on-base', label: 'The base alone' },
];

/** How much of each component to pour for a pot of the size wanted. */
export function MixSection({ units }: { units: UnitSystem }) {
  const { values, change } = useTextFields(() => ({
    wanted: startText(units === 'us' ? usGallonsToLitres(0.5) : 2, 'liquidVolume', units),
    base: '4',
    hardener: '1',
    thinning: '10',
    basis: 'on-mix',
  }));
  const outcome = attempt(() =>
    mixQuantities({
      wantedL: readSi(values.wanted, 'liquidVolume', units),
      ratio: { base: readNumber(values.base), hardener: readNumber(values.hardener) },
      thinningPct: readNumber(values.thinning),
      thinnerBasis: values.basis as MixInput['thinnerBasis'],
    }),
  );
  const errors = fieldErrors(outcome);
  // Pots are small: one more digit than elsewhere so a US measure is not rounded to nothing.
  const show = (litres: number) => formatQuantity(litres, 'liquidVolume', units, displayDigits('liquidVolume', units) + 1);
  const mix = outcome.ok ? outcome.value : null;

  return (
    <CalculatorSection title="Mix" intro="Ratios are by volume, as on the data sheet. Enter 0 hardener for a one-pack product.">
      <FieldGrid>
        <NumberField label="Ready-to-spray amount wanted" unit={unitSymbol('liquidVolume', units)} value={values.wanted} onChange={change('wanted')} error={errors.wantedL} />
        <NumberField label="Thinning" unit="% by volume" value={values.thinning} onChange={change('thinning')} error={errors.thinningPct} />
        <NumberField label="Base parts" value={values.base} onChange={change('base')} error={errors['ratio.base']} />
        <NumberField label="Hardener parts" value={values.hardener} onChange={change('hardener')} error={errors['ratio.hardener']} />
        <ChoiceField
          label="Thinning % is measured against"
          value={values.basis}
          onChange={change('basis')}
          options={basisOptions}
          hint="Data sheets differ; check which yours means."
          className="sm:col-span-2"
        />
      </FieldGrid>
      <Results label="Mix result">
        <ResultItem term="Base">{mix ? show(mix.baseL) : '—'}</ResultItem>
        <ResultItem term="Hardener">{mix ? show(mix.hardenerL) : '—'}</ResultItem>
        <ResultItem term="Thinner">{mix ? show(mix.thinnerL) : '—'}</ResultItem>
        <ResultItem term="Total in the pot">{mix ? show(mix.totalL) : '—'}</ResultItem>
      </Results>
    </CalculatorSection>
  );
}
