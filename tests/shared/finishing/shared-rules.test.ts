import { describe, expect, it } from 'vitest';
import { FinishingInputError } from '../../../shared/errors';
import { coatDryingTempC } from '../../../shared/finishing/drying-temperature';
import { potLifeReferenceTempC, potWarnings } from '../../../shared/finishing/pot-life';
import { dryingStateAt, readinessMovedOn, recoatWindowClosed } from '../../../shared/finishing/readiness';

// The rules both the server (when it records) and the client (when it previews or moves a board on) call.

describe('coatDryingTempC', () => {
  // DESIGN.md formula 2: the rack's drying temperature when the part goes to a heated rack, else the coat's air temperature.
  it('takes the heated rack when every part goes onto one', () => {
    expect(coatDryingTempC([40], 18)).toBe(40);
  });

  // Coolest of several heated racks: Boothwright's rule, so no part is promised more drying than its rack gives (common practice, no published source).
  it('takes the coolest heated rack when the parts are spread over several', () => {
    expect(coatDryingTempC([40, 35, 40], 18)).toBe(35);
  });

  // DESIGN.md formula 2: otherwise the coat's air temperature.
  it('takes the booth air when any part is on an unheated rack or none, or there are no parts', () => {
    expect(coatDryingTempC([40, null], 18)).toBe(18);
    expect(coatDryingTempC([], 18)).toBe(18);
  });

  it('refuses an air temperature that is not a number', () => {
    expect(() => coatDryingTempC([null], Number.NaN)).toThrow(FinishingInputError);
  });
});

describe('potLifeReferenceTempC', () => {
  // Data sheets quote times at a standard atmosphere, 23 °C or 20 °C (ISO 3270 / EN 23270); taking the row nearest 20 °C is common practice, no published source.
  it('takes the drying-times row nearest 20 °C', () => {
    expect(potLifeReferenceTempC([{ tempC: 10 }, { tempC: 23 }, { tempC: 35 }])).toBe(23);
    expect(potLifeReferenceTempC([{ tempC: 5 }, { tempC: 15 }])).toBe(15);
  });

  it('refuses a data sheet with no drying times rather than assume 20 °C', () => {
    expect(() => potLifeReferenceTempC([])).toThrow(FinishingInputError);
  });
});

describe('potWarnings', () => {
  const mix = { inductionEndsAt: '2026-03-02T09:15:00Z', potLifeEndsAt: '2026-03-02T13:00:00Z' };
  // The pot's own instants (worked out when it was mixed, DESIGN.md formula 7) decide; these checks only read them.
  it('stops a coat sprayed from a pot past its pot life, with the recorded words', () => {
    expect(potWarnings(mix, new Date('2026-03-02T13:00:01Z'))).toEqual([
      { code: 'pot-life-expired', verdict: 'stop', message: 'The pot was past its pot life when this coat went on.' },
    ]);
  });

  it('cautions a coat from a pot still standing, and says nothing in between or for a pot with no pot life', () => {
    expect(potWarnings(mix, new Date('2026-03-02T09:00:00Z'))[0]).toMatchObject({
      code: 'induction-not-over',
      verdict: 'caution',
    });
    expect(potWarnings(mix, new Date('2026-03-02T10:00:00Z'))).toEqual([]);
    expect(potWarnings({ ...mix, potLifeEndsAt: null }, new Date('2026-03-03T10:00:00Z'))).toEqual([]);
  });
});

describe('dryingStateAt and readinessMovedOn', () => {
  const at = (iso: string) => new Date(iso);
  const times = {
    handleAt: at('2026-03-02T12:00:00Z'),
    packAt: at('2026-03-02T20:00:00Z'),
    fullCureAt: at('2026-03-09T10:00:00Z'),
  };
  // DESIGN.md formula 3: drying, ready to handle, ready to pack, cured; each begins at its instant.
  it('moves a finished part along as its instants pass', () => {
    expect(dryingStateAt(times, at('2026-03-02T11:59:59Z'))).toBe('drying');
    expect(dryingStateAt(times, at('2026-03-02T12:00:00Z'))).toBe('ready-to-handle');
    expect(dryingStateAt(times, at('2026-03-02T20:00:00Z'))).toBe('ready-to-pack');
    expect(dryingStateAt(times, at('2026-03-09T10:00:00Z'))).toBe('cured');
  });

  it('moves an earlier answer on, never back, and leaves states before the last coat alone', () => {
    expect(readinessMovedOn('drying', times, at('2026-03-02T13:00:00Z'))).toBe('ready-to-handle');
    expect(readinessMovedOn('ready-to-pack', times, at('2026-03-02T13:00:00Z'))).toBe('ready-to-pack');
    expect(readinessMovedOn('in-finish', times, at('2026-03-10T00:00:00Z'))).toBe('in-finish');
    expect(readinessMovedOn('collected', times, at('2026-03-10T00:00:00Z'))).toBe('collected');
  });

  // DESIGN.md formula 3: a window closes at its closing instant; "never" (no closing time) never closes.
  it('closes a recoat window at its closing instant', () => {
    expect(recoatWindowClosed(at('2026-03-02T12:00:00Z'), at('2026-03-02T11:59:59Z'))).toBe(false);
    expect(recoatWindowClosed(at('2026-03-02T12:00:00Z'), at('2026-03-02T12:00:00Z'))).toBe(true);
    expect(recoatWindowClosed(null, at('2030-01-01T00:00:00Z'))).toBe(false);
  });
});
