import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { clearanceTimeMin } from '../../../shared/finishing/booth-air';
import { adjustDryingTimes, type DryingRow, type DryingTimes } from '../../../shared/finishing/drying-times';
import { dryFilmUm, wetFilmTargetUm } from '../../../shared/finishing/film';
import { litresNeeded } from '../../../shared/finishing/material';
import { fromDisplay, quantities, toDisplay } from '../../../shared/units';

const maxRows = 4;
const timeKeys = ['flashOffMin', 'recoatMinMin', 'touchDryMin', 'handleMin', 'packMin', 'fullCureH'] as const;
const relativelyClose = (a: number, b: number, tolerance: number) => Math.abs(a - b) <= tolerance * Math.max(1, Math.abs(b));

/** Times for one field, one per row, longest first (rows are built coldest first); 8000 keeps hours under the schema cap. */
const slowingColumn = fc
  .array(fc.double({ min: 0.5, max: 8000, noNaN: true }), { minLength: maxRows, maxLength: maxRows })
  .map((values) => [...values].sort((a, b) => b - a));

/** A drying table whose every time gets shorter as it gets warmer, as real data sheets do. */
const monotoneTable = fc
  .record({
    temps: fc.uniqueArray(fc.integer({ min: -5, max: 60 }), { minLength: 1, maxLength: maxRows }),
    columns: fc.tuple(...timeKeys.map(() => slowingColumn)),
    windowExtra: slowingColumn,
    closes: fc.boolean(),
  })
  .map(({ temps, columns, windowExtra, closes }) =>
    [...temps]
      .sort((a, b) => a - b)
      .map((tempC, row): DryingRow => {
        const [flashOffMin, recoatMinMin, touchDryMin, handleMin, packMin, fullCureH] = columns.map((column) => column[row]);
        const recoatMaxMin = closes ? recoatMinMin + windowExtra[row] : null;
        return { tempC, flashOffMin, recoatMinMin, recoatMaxMin, touchDryMin, handleMin, packMin, fullCureH };
      }),
  );

const allTimes = (times: DryingTimes) => [...timeKeys.map((key) => times[key]), times.recoatMaxMin ?? Infinity];

describe('drying-time properties', () => {
  it('never makes a colder part ready earlier', () => {
    fc.assert(
      fc.property(monotoneTable, fc.double({ min: -10, max: 70, noNaN: true }), fc.double({ min: 0, max: 20, noNaN: true }), (table, warm, drop) => {
        const colder = allTimes(adjustDryingTimes(table, warm - drop).times);
        const warmer = allTimes(adjustDryingTimes(table, warm).times);
        return colder.every((time, i) => time >= warmer[i] * (1 - 1e-12));
      }),
    );
  });

  it('passes through every row of the table, and runs continuously into it', () => {
    fc.assert(
      fc.property(monotoneTable, (table) => {
        for (const row of table) {
          for (const tempC of [row.tempC, row.tempC + 1e-7, row.tempC - 1e-7]) {
            const times = adjustDryingTimes(table, tempC).times;
            for (const key of timeKeys) expect(relativelyClose(times[key], row[key], 1e-6)).toBe(true);
            if (row.recoatMaxMin !== null) expect(relativelyClose(times.recoatMaxMin ?? NaN, row.recoatMaxMin, 1e-6)).toBe(true);
          }
        }
      }),
    );
  });
});

const volumeSolidsPct = fc.double({ min: 1, max: 100, noNaN: true });
const thinningPct = fc.double({ min: 0, max: 200, noNaN: true });

describe('film and material properties', () => {
  it('never gives a dry film thicker than the wet film', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 2000, noNaN: true }), volumeSolidsPct, thinningPct, (wetFilmUm, vs, t) => {
        // At 100 % solids and no thinner the two are equal; float rounding may put one a ulp above.
        return dryFilmUm({ wetFilmUm, volumeSolidsPct: vs, thinningPct: t }) <= wetFilmUm * (1 + 1e-12);
      }),
    );
  });

  it('reads its own wet-film target back to the dry film asked for', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 500, noNaN: true }), volumeSolidsPct, thinningPct, (dry, vs, t) => {
        const wetFilmUm = wetFilmTargetUm({ dryFilmUm: dry, volumeSolidsPct: vs, thinningPct: t });
        return relativelyClose(dryFilmUm({ wetFilmUm, volumeSolidsPct: vs, thinningPct: t }), dry, 1e-12);
      }),
    );
  });

  it('needs k times the paint for k times the area', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 1000, noNaN: true }),
        fc.double({ min: 0.01, max: 100, noNaN: true }),
        fc.integer({ min: 1, max: 6 }),
        fc.double({ min: 5, max: 300, noNaN: true }),
        volumeSolidsPct,
        fc.double({ min: 1, max: 100, noNaN: true }),
        (areaM2, k, coats, dryFilm, vs, te) => {
          const job = { coats, dryFilmUm: dryFilm, volumeSolidsPct: vs, transferEfficiencyPct: te };
          return relativelyClose(litresNeeded({ ...job, areaM2: areaM2 * k }), k * litresNeeded({ ...job, areaM2 }), 1e-12);
        },
      ),
    );
  });
});

describe('booth-air properties', () => {
  const booth = fc.record({
    volumeM3: fc.double({ min: 1, max: 5000, noNaN: true }),
    extractionM3PerH: fc.double({ min: 100, max: 200000, noNaN: true }),
    mixingFactorK: fc.double({ min: 1, max: 10, noNaN: true }),
  });
  const growth = fc.double({ min: 1.001, max: 100, noNaN: true });

  it('takes longer to clear a bigger booth', () => {
    fc.assert(fc.property(booth, growth, (b, g) => clearanceTimeMin({ ...b, volumeM3: b.volumeM3 * g }) > clearanceTimeMin(b)));
  });

  it('clears faster with more extraction', () => {
    fc.assert(
      fc.property(booth, growth, (b, g) => clearanceTimeMin({ ...b, extractionM3PerH: b.extractionM3PerH * g }) < clearanceTimeMin(b)),
    );
  });
});

describe('unit display properties', () => {
  it('round-trips every quantity through either unit system', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...quantities),
        fc.constantFrom('metric' as const, 'us' as const),
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        (quantity, system, value) => relativelyClose(fromDisplay(toDisplay(value, quantity, system), quantity, system), value, 1e-9),
      ),
    );
  });
});
