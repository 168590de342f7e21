import { describe, expect, it } from 'vitest';
import { nextStepWords } from '../../../../src/features/spray-session/utils/session-format';

const denibNext = (grit: string, coatsDone: number) => ({ nextStepKind: 'denib' as const, nextStepGrit: grit, nextStepDryFilmUm: null, coatsDone, coatsTotal: 3, abradeRequired: true });
const coatNext = (dryFilmUm: number, coatsDone: number, abradeRequired = false) => ({ nextStepKind: 'coat' as const, nextStepGrit: null, nextStepDryFilmUm: dryFilmUm, coatsDone, coatsTotal: 3, abradeRequired });

describe('nextStepWords on the latest coat card', () => {
  it('says a planned denib step with its own grit, then the coat that follows', () => {
    expect(nextStepWords(denibNext('P400', 1))).toBe('denib with P400, then coat 2 of 3');
  });
  it('names the next coat by its number and its film', () => {
    expect(nextStepWords(coatNext(40, 1))).toBe('coat 2 of 3 (40 µm dry)');
  });
  it('puts a missed window’s denib first when the step itself is a coat', () => {
    expect(nextStepWords(coatNext(40, 2, true))).toBe('denib with P320 first (the window was missed), then coat 3 of 3 (40 µm dry)');
  });
  it('names just the coat when no step remains to describe', () => {
    expect(nextStepWords({ nextStepKind: null, nextStepGrit: null, nextStepDryFilmUm: null, coatsDone: 3, coatsTotal: 3, abradeRequired: false })).toBe('coat 3 of 3');
  });
});
