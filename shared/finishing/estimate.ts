import { litresNeeded, mixQuantities, vocGrams, type MixQuantities } from './material';

export type EstimateProduct = {
  id: number;
  name: string;
  volumeSolidsPct: number;
  mixBaseParts: number;
  mixHardenerParts: number;
  /** The thinning planned for the estimate: the least the data sheet allows. */
  thinnerMinPct: number;
  vocGPerL: number | null;
  pricePerL: number | null;
};

export type EstimateStep = { position: number; dryFilmUm: number; product: EstimateProduct };

export type StepEstimate = {
  position: number;
  productId: number;
  productName: string;
  dryFilmUm: number;
  /** Base + hardener as mixed, before thinner: what the volume solids figure describes. */
  mixedL: number;
  /** Ready to spray, thinner included: what goes through the gun. */
  readyToSprayL: number;
  mix: MixQuantities;
  vocG: number | null;
  cost: number | null;
};

export type MaterialEstimate = {
  areaM2: number;
  transferEfficiencyPct: number;
  steps: StepEstimate[];
  totals: { mixedL: number; readyToSprayL: number; vocG: number; cost: number; stepsWithoutVoc: number; stepsWithoutPrice: number };
};

function estimateStep(step: EstimateStep, areaM2: number, transferEfficiencyPct: number): StepEstimate {
  const { product } = step;
  const mixedL = litresNeeded({ areaM2, coats: 1, dryFilmUm: step.dryFilmUm, volumeSolidsPct: product.volumeSolidsPct, transferEfficiencyPct });
  // Thinner carries no solids: it adds volume on top of the mixed product (thinning % on the mix).
  const readyToSprayL = mixedL * (1 + product.thinnerMinPct / 100);
  const mix = mixQuantities({ wantedL: readyToSprayL, ratio: { base: product.mixBaseParts, hardener: product.mixHardenerParts }, thinningPct: product.thinnerMinPct, thinnerBasis: 'on-mix' });
  return {
    position: step.position,
    productId: product.id,
    productName: product.name,
    dryFilmUm: step.dryFilmUm,
    mixedL,
    readyToSprayL,
    mix,
    vocG: product.vocGPerL === null ? null : vocGrams({ litres: readyToSprayL, vocGPerL: product.vocGPerL }),
    // Priced per litre of mixed product; thinner is cheap enough to leave out of a job estimate.
    cost: product.pricePerL === null ? null : mixedL * product.pricePerL,
  };
}

/** Material for one coat of each coat step over the job's coated area. */
export function estimateMaterial({ areaM2, transferEfficiencyPct, steps }: { areaM2: number; transferEfficiencyPct: number; steps: EstimateStep[] }): MaterialEstimate {
  const estimates = areaM2 > 0 ? steps.map((step) => estimateStep(step, areaM2, transferEfficiencyPct)) : [];
  const sum = (pick: (s: StepEstimate) => number | null) => estimates.reduce((total, s) => total + (pick(s) ?? 0), 0);
  return {
    areaM2,
    transferEfficiencyPct,
    steps: estimates,
    totals: {
      mixedL: sum((s) => s.mixedL),
      readyToSprayL: sum((s) => s.readyToSprayL),
      vocG: sum((s) => s.vocG),
      cost: sum((s) => s.cost),
      stepsWithoutVoc: estimates.filter((s) => s.vocG === null).length,
      stepsWithoutPrice: estimates.filter((s) => s.cost === null).length,
    },
  };
}
