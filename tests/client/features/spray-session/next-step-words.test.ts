import { describe, expect, it } from 'vitest';
import { nextStepWords } from '../../../../src/features/spray-session/utils/session-format';

const part = (nextStep: string, coatsDone: number, abradeRequired = false) => ({ nextStep, coatsDone, coatsTotal: 3, abradeRequired });

describe('nextStepWords on the latest coat card', () => {
  it('says a planned abrade step as the denib it is, then the coat that follows', () => {
    expect(nextStepWords(part('Abrade P320', 1, true))).toBe('denib with P320, then coat 2 of 3');
  });
  it('names the next coat by its number and its film', () => {
    expect(nextStepWords(part('Coat at 40 µm dry', 1))).toBe('coat 2 of 3 (40 µm dry)');
  });
  it('puts a missed window’s denib first when the step itself is a coat', () => {
    expect(nextStepWords(part('Coat at 40 µm dry', 2, true))).toBe('denib with P320 first (the window was missed), then coat 3 of 3 (40 µm dry)');
  });
});
