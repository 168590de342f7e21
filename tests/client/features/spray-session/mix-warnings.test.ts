import { describe, expect, it } from 'vitest';
import type { Mix } from '../../../../shared/schemas/checklist';
import { mixWarnings } from '../../../../src/features/spray-session/utils/coat-preview';

const mixedAt = '2026-03-10T09:00:00.000Z';
const mix = (inductionMin: number, potLifeMin: number | null) =>
  ({
    mixedAt,
    inductionEndsAt: new Date(Date.parse(mixedAt) + inductionMin * 60_000).toISOString(),
    potLifeEndsAt: potLifeMin === null ? null : new Date(Date.parse(mixedAt) + potLifeMin * 60_000).toISOString(),
  }) as Mix;
const at = (secondsAfterMixing: number) => new Date(Date.parse(mixedAt) + secondsAfterMixing * 1000);

describe('mixWarnings in the coat preview', () => {
  it('gives no induction caution for a pot with no stand time, even when the preview clock reads a moment before the mixing', () => {
    expect(mixWarnings(mix(0, null), at(-10))).toEqual([]);
  });
  it('still cautions while a pot with a stand time is standing, and not after', () => {
    expect(mixWarnings(mix(10, 120), at(-10)).map((w) => w.code)).toEqual(['induction-not-over']);
    expect(mixWarnings(mix(10, 120), at(5 * 60)).map((w) => w.code)).toEqual(['induction-not-over']);
    expect(mixWarnings(mix(10, 120), at(11 * 60))).toEqual([]);
  });
  it('stops a coat from a pot past its pot life', () => {
    expect(mixWarnings(mix(0, 60), at(61 * 60)).map((w) => w.code)).toEqual(['pot-life-expired']);
  });
});
