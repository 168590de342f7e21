import type { CreateProductInput } from '../../shared/schemas/product';

// An invented maker ("Kestrel Finishes") and invented products. The figures are typical of
// their chemistries so the maths has something realistic to work on; they are not any real
// product's data sheet.
const row = (tempC: number, flashOffMin: number, recoatMinMin: number, recoatMaxMin: number | null, touchDryMin: number, handleMin: number, packMin: number, fullCureH: number) => ({
  tempC, flashOffMin, recoatMinMin, recoatMaxMin, touchDryMin, handleMin, packMin, fullCureH,
});

export const demoProducts: CreateProductInput[] = [
  {
    name: 'Kestrel AquaPrime WB primer', makerRef: 'KF-WP-210', kind: 'primer', chemistry: 'water-borne', volumeSolidsPct: 38, densityKgPerL: 1.32,
    thinnerMaxPct: 5, dryFilmPerCoatUm: 40, referenceRhPct: 55, minApplicationTempC: 12, maxRelativeHumidityPct: 80, vocGPerL: 60, pricePerL: 14.5,
    dryingTimes: [row(20, 10, 60, null, 20, 90, 360, 168), row(12, 20, 150, null, 45, 210, 720, 336)],
  },
  {
    name: 'Kestrel Sanding Sealer NC', makerRef: 'KF-SS-040', kind: 'sealer', chemistry: 'solvent-borne', volumeSolidsPct: 22, densityKgPerL: 0.92,
    thinnerMinPct: 0, thinnerMaxPct: 15, dryFilmPerCoatUm: 25, minApplicationTempC: 10, maxRelativeHumidityPct: 80, vocGPerL: 650, flashPointC: 4,
    hazards: ['flammable'], pricePerL: 9.8, dryingTimes: [row(20, 5, 30, null, 10, 30, 120, 72)],
  },
  {
    name: 'Kestrel 2K PU Primer White', makerRef: 'KF-PP-300', kind: 'undercoat', chemistry: 'two-component-polyurethane', volumeSolidsPct: 45, densityKgPerL: 1.45,
    mixBaseParts: 2, mixHardenerParts: 1, thinnerMinPct: 10, thinnerMaxPct: 20, potLifeMin: 120, dryFilmPerCoatUm: 60, referenceRhPct: 60, minApplicationTempC: 12,
    maxRelativeHumidityPct: 80, vocGPerL: 480, flashPointC: 24, hazards: ['isocyanate', 'flammable', 'sensitiser'], pricePerL: 18.9,
    dryingTimes: [row(20, 10, 120, 1440, 30, 180, 480, 168), row(10, 20, 240, 2880, 60, 360, 960, 336)],
  },
  {
    name: 'Kestrel 2K PU Topcoat Satin', makerRef: 'KF-PT-420', kind: 'topcoat', chemistry: 'two-component-polyurethane', volumeSolidsPct: 40, densityKgPerL: 1.2,
    mixBaseParts: 4, mixHardenerParts: 1, thinnerMinPct: 10, thinnerMaxPct: 25, potLifeMin: 180, dryFilmPerCoatUm: 40, referenceRhPct: 60, minApplicationTempC: 15,
    maxRelativeHumidityPct: 75, vocGPerL: 520, flashPointC: 25, hazards: ['isocyanate', 'flammable', 'sensitiser'], pricePerL: 24.5,
    dryingTimes: [row(23, 10, 180, 2880, 40, 240, 720, 168), row(15, 20, 360, 4320, 80, 480, 1440, 240)],
  },
  {
    name: 'Kestrel Precat Clear Matt', makerRef: 'KF-AC-115', kind: 'clear', chemistry: 'acid-catalysed', volumeSolidsPct: 28, densityKgPerL: 0.98,
    mixBaseParts: 10, mixHardenerParts: 1, thinnerMinPct: 0, thinnerMaxPct: 10, potLifeMin: 1440, dryFilmPerCoatUm: 30, minApplicationTempC: 15, maxRelativeHumidityPct: 75,
    vocGPerL: 590, flashPointC: 12, hazards: ['formaldehyde', 'flammable'], pricePerL: 15.2, dryingTimes: [row(20, 10, 45, 1440, 15, 60, 240, 120)],
  },
  {
    name: 'Kestrel AquaTop WB Topcoat Satin', makerRef: 'KF-WT-330', kind: 'topcoat', chemistry: 'water-borne', volumeSolidsPct: 34, densityKgPerL: 1.05,
    thinnerMaxPct: 5, dryFilmPerCoatUm: 35, referenceRhPct: 55, minApplicationTempC: 15, maxRelativeHumidityPct: 75, vocGPerL: 45, pricePerL: 19.5,
    dryingTimes: [row(20, 15, 120, null, 30, 180, 480, 168), row(15, 25, 200, null, 55, 300, 840, 240)],
  },
  {
    name: 'Kestrel 2K Acrylic Clear Gloss', makerRef: 'KF-AK-505', kind: 'clear', chemistry: 'two-component-acrylic', volumeSolidsPct: 42, densityKgPerL: 1.0,
    mixBaseParts: 2, mixHardenerParts: 1, thinnerMinPct: 5, thinnerMaxPct: 15, potLifeMin: 90, dryFilmPerCoatUm: 45, minApplicationTempC: 15, maxRelativeHumidityPct: 75,
    vocGPerL: 500, flashPointC: 26, hazards: ['isocyanate', 'flammable', 'sensitiser'], pricePerL: 27,
    dryingTimes: [row(20, 10, 240, 1440, 45, 300, 900, 168)],
  },
  {
    name: 'Kestrel UV Sealer 100', makerRef: 'KF-UV-100', kind: 'sealer', chemistry: 'uv-cure', volumeSolidsPct: 95, densityKgPerL: 1.1,
    dryFilmPerCoatUm: 20, minApplicationTempC: 15, maxRelativeHumidityPct: 80, vocGPerL: 15, hazards: ['sensitiser'], pricePerL: 31,
    dryingTimes: [row(20, 5, 10, null, 10, 10, 15, 1)],
  },
];
