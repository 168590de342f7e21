import { useState } from 'react';
import { dryFilmUm, filmTolerancePct, filmVerdict, type FilmVerdict } from '../../../../shared/finishing/film';
import type { Verdict } from '../../../../shared/finishing/conditions';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { formatQuantity, unitSymbol } from '../../../../shared/units';
import { ResultItem, Results, VerdictBadge } from './calculator-output';
import { attempt, readNumber, readSi } from './calculator-values';
import { NumberField } from './number-field';

const verdictFor: Record<FilmVerdict, { verdict: Verdict; words: string }> = {
  thin: { verdict: 'caution', words: 'Thin: add film on the next pass' },
  'on-target': { verdict: 'go', words: 'On target' },
  heavy: { verdict: 'caution', words: 'Heavy: risk of runs and slow drying' },
};

type CombCheckProps = { units: UnitSystem; solidsText: string; thinningText: string; targetDryUm: number };

/** A wet-film comb reading turned into the dry film it will leave, against the target per coat. */
export function CombCheck({ units, solidsText, thinningText, targetDryUm }: CombCheckProps) {
  const [wet, setWet] = useState('');
  const outcome = attempt(() => {
    const dry = dryFilmUm({ wetFilmUm: readSi(wet, 'filmThickness', units), volumeSolidsPct: readNumber(solidsText), thinningPct: readNumber(thinningText) });
    return { dry, verdict: filmVerdict(dry, targetDryUm) };
  });
  const error = wet.trim() !== '' && !outcome.ok && outcome.field === 'wetFilmUm' ? outcome.message : undefined;
  return (
    <div className="space-y-3">
      <NumberField
        label="Wet film read on the comb"
        unit={unitSymbol('filmThickness', units)}
        value={wet}
        onChange={setWet}
        hint={`Read straight after spraying. Within ±${filmTolerancePct} % of the target counts as on target.`}
        error={error}
      />
      {outcome.ok && (
        <Results label="Comb reading result">
          <ResultItem term="Dry film it will leave">{formatQuantity(outcome.value.dry, 'filmThickness', units)}</ResultItem>
          <ResultItem term="Against the target">
            <VerdictBadge verdict={verdictFor[outcome.value.verdict].verdict} label={verdictFor[outcome.value.verdict].words} />
          </ResultItem>
        </Results>
      )}
    </div>
  );
}
