import { theoreticalSpreadingRateM2PerL, thinnedVolumeSolidsPct, wetFilmTargetUm } from '../../../../shared/finishing/film';
import { litresNeeded, sprayMethodIds, sprayMethods, vocGrams, type SprayMethod } from '../../../../shared/finishing/material';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { formatQuantity, unitSymbol } from '../../../../shared/units';
import { CalculatorSection, FieldGrid, ResultItem, Results } from './calculator-output';
import { attempt, fieldErrors, formatPercent, readNumber, readSi, startText, type Outcome } from './calculator-values';
import { CombCheck } from './comb-check';
import { ChoiceField, NumberField } from './number-field';
import { useTextFields } from './use-text-fields';

const methodOptions = sprayMethodIds.map((id) => ({ value: id, label: sprayMethods[id].label }));

/** Film build and paint needed for an area: wet-film target, spreading rate, litres and VOC. */
export function FilmMaterialSection({ units }: { units: UnitSystem }) {
  const { values, change } = useTextFields(() => ({
    area: startText(10, 'area', units),
    coats: '2',
    dryFilm: startText(40, 'filmThickness', units),
    solids: '30',
    thinning: '10',
    method: 'hvlp',
    efficiency: String(sprayMethods.hvlp.transferEfficiencyPct),
    voc: startText(420, 'vocContent', units),
  }));
  const chooseMethod = (method: string) => {
    change('method')(method);
    change('efficiency')(String(sprayMethods[method as SprayMethod].transferEfficiencyPct));
  };
  const job: FilmJob = {
    areaM2: readSi(values.area, 'area', units),
    coats: readNumber(values.coats),
    dryFilmUm: readSi(values.dryFilm, 'filmThickness', units),
    volumeSolidsPct: readNumber(values.solids),
    thinningPct: readNumber(values.thinning),
    transferEfficiencyPct: readNumber(values.efficiency),
    vocGPerL: readSi(values.voc, 'vocContent', units),
  };
  const results = computeFilm(job);
  const errors = fieldErrors(...Object.values(results));
  const symbol = (quantity: Parameters<typeof unitSymbol>[0]) => unitSymbol(quantity, units);

  return (
    <CalculatorSection
      title="Film and material"
      intro="For second and later coats. A first coat on bare timber or MDF soaks in, so judge it from the data sheet or past jobs."
    >
      <FieldGrid>
        <NumberField label="Area to coat" unit={symbol('area')} value={values.area} onChange={change('area')} error={errors.areaM2} />
        <NumberField label="Number of coats" value={values.coats} onChange={change('coats')} error={errors.coats} />
        <NumberField label="Dry film per coat" unit={symbol('filmThickness')} value={values.dryFilm} onChange={change('dryFilm')} error={errors.dryFilmUm} />
        <NumberField label="Volume solids" unit="%" value={values.solids} onChange={change('solids')} error={errors.volumeSolidsPct} />
        <NumberField label="Thinning" unit="% by volume" value={values.thinning} onChange={change('thinning')} error={errors.thinningPct} />
        <ChoiceField label="Spray method" value={values.method} onChange={chooseMethod} options={methodOptions} />
        <NumberField
          label="Transfer efficiency"
          unit="%"
          value={values.efficiency}
          onChange={change('efficiency')}
          hint="A typical figure for the method; change it to your own."
          error={errors.transferEfficiencyPct}
        />
        <NumberField label="VOC as applied" unit={symbol('vocContent')} value={values.voc} onChange={change('voc')} error={errors.vocGPerL} />
      </FieldGrid>
      <div className="space-y-4">
        <FilmResults results={results} units={units} />
        <CombCheck units={units} solidsText={values.solids} thinningText={values.thinning} targetDryUm={job.dryFilmUm} />
      </div>
    </CalculatorSection>
  );
}

type FilmJob = { areaM2: number; coats: number; dryFilmUm: number; volumeSolidsPct: number; thinningPct: number; transferEfficiencyPct: number; vocGPerL: number };
type FilmOutcomes = Record<'wetFilm' | 'thinnedSolids' | 'spreadingRate' | 'paint' | 'thinner' | 'voc', Outcome<number>>;

function computeFilm(job: FilmJob): FilmOutcomes {
  const thinnedSolids = attempt(() => thinnedVolumeSolidsPct(job));
  const paint = attempt(() => litresNeeded(job));
  // NaN until both the paint and the thinning are valid, so the results show a dash rather than a wrong zero.
  const paintL = paint.ok && thinnedSolids.ok ? paint.value : Number.NaN;
  const thinnerL = (paintL * job.thinningPct) / 100;
  return {
    wetFilm: attempt(() => wetFilmTargetUm(job)),
    thinnedSolids,
    spreadingRate: attempt(() => theoreticalSpreadingRateM2PerL(job)),
    paint,
    thinner: { ok: true, value: thinnerL },
    // VOC as applied is per litre of ready-to-spray material, so the thinner counts too.
    voc: attempt(() => vocGrams({ litres: paintL + thinnerL, vocGPerL: job.vocGPerL })),
  };
}

function FilmResults({ results, units }: { results: FilmOutcomes; units: UnitSystem }) {
  const show = (outcome: Outcome<number>, format: (value: number) => string) =>
    outcome.ok && Number.isFinite(outcome.value) ? format(outcome.value) : '—';
  return (
    <Results label="Film and material result">
      <ResultItem term="Wet film to aim for">{show(results.wetFilm, (v) => formatQuantity(v, 'filmThickness', units))}</ResultItem>
      <ResultItem term="Solids once thinned">{show(results.thinnedSolids, (v) => formatPercent(v))}</ResultItem>
      <ResultItem term="Theoretical spreading rate">{show(results.spreadingRate, (v) => formatQuantity(v, 'spreadingRate', units))}</ResultItem>
      <ResultItem term="Paint needed, before thinner">{show(results.paint, (v) => formatQuantity(v, 'liquidVolume', units))}</ResultItem>
      <ResultItem term="Thinner to add">{show(results.thinner, (v) => formatQuantity(v, 'liquidVolume', units))}</ResultItem>
      <ResultItem term="VOC released">{show(results.voc, (v) => formatQuantity(v, 'mass', units))}</ResultItem>
    </Results>
  );
}
