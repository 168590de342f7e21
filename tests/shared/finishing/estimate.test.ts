import { describe, expect, it } from 'vitest';
import { estimateMaterial, type EstimateProduct } from '../../../shared/finishing/estimate';

const primer: EstimateProduct = { id: 1, name: 'Primer', volumeSolidsPct: 45, mixBaseParts: 2, mixHardenerParts: 1, thinnerMinPct: 10, vocGPerL: 480, pricePerL: 20 };
const topcoat: EstimateProduct = { id: 2, name: 'Top', volumeSolidsPct: 40, mixBaseParts: 4, mixHardenerParts: 1, thinnerMinPct: 0, vocGPerL: null, pricePerL: null };

describe('estimateMaterial', () => {
  it('matches a hand-worked estimate for a 2K primer', () => {
    // Worked by hand from the spreading-rate relation TSR = VS × 10 / DFT (coatings makers'
    // "volume solids and spreading rate" handy calculations):
    //   TSR = 45 × 10 / 60 = 7.5 m²/L; with 60 % transfer efficiency 4.5 m²/L
    //   20 m² → 20 / 4.5 = 4.4444 L mixed; + 10 % thinner → 4.8889 L ready to spray
    //   mix 2 : 1 with 10 % on the mix: base 2.9630, hardener 1.4815, thinner 0.4444 L
    //   VOC 4.8889 × 480 = 2346.7 g; cost 4.4444 × 20 = 88.89
    const { steps, totals } = estimateMaterial({ areaM2: 20, transferEfficiencyPct: 60, steps: [{ position: 0, dryFilmUm: 60, product: primer }] });
    expect(steps[0].mixedL).toBeCloseTo(4.4444, 4);
    expect(steps[0].readyToSprayL).toBeCloseTo(4.8889, 4);
    expect(steps[0].mix.baseL).toBeCloseTo(2.963, 3);
    expect(steps[0].mix.hardenerL).toBeCloseTo(1.4815, 4);
    expect(steps[0].mix.thinnerL).toBeCloseTo(0.4444, 4);
    expect(totals.vocG).toBeCloseTo(2346.67, 2);
    expect(totals.cost).toBeCloseTo(88.89, 2);
  });

  it('adds steps together and counts steps without VOC or price instead of guessing', () => {
    const { totals } = estimateMaterial({
      areaM2: 20,
      transferEfficiencyPct: 60,
      steps: [
        { position: 0, dryFilmUm: 60, product: primer },
        // 40 × 10 / 40 = 10 m²/L; × 0.6 = 6 m²/L; 20 / 6 = 3.3333 L
        { position: 2, dryFilmUm: 40, product: topcoat },
      ],
    });
    expect(totals.mixedL).toBeCloseTo(4.4444 + 3.3333, 3);
    expect(totals.stepsWithoutVoc).toBe(1);
    expect(totals.stepsWithoutPrice).toBe(1);
  });

  it('estimates nothing for a job with no parts yet', () => {
    expect(estimateMaterial({ areaM2: 0, transferEfficiencyPct: 60, steps: [{ position: 0, dryFilmUm: 60, product: primer }] }).steps).toEqual([]);
  });
});
