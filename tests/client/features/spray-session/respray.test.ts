import { describe, expect, it } from 'vitest';
import type { Coat } from '../../../../shared/schemas/coat';
import type { ReadyPart } from '../../../../shared/schemas/ready';
import { repeatsStep } from '../../../../src/features/spray-session/utils/respray';
import type { CoatStep } from '../../../../src/features/spray-session/utils/session-plan';

// Primer at position 0, an abrade at 1, topcoat at 2: the topcoat is the second coat step.
const primer: CoatStep = { kind: 'coat', position: 0, productId: 1, productName: 'Primer', dryFilmUm: 40 };
const topcoat: CoatStep = { kind: 'coat', position: 2, productId: 2, productName: 'Topcoat', dryFilmUm: 35 };
const steps = [primer, topcoat];
const ready = (coatsDone: number) => new Map([[7, { id: 7, coatsDone } as ReadyPart]]);
const coatAt = (stepPosition: number, supersededById: number | null = null) => ({ partIds: [7, 8], stepPosition, supersededById }) as Coat;

describe('repeatsStep', () => {
  it('is false for the next step a part has not had', () => {
    expect(repeatsStep([7], topcoat, steps, ready(1), [])).toBe(false);
  });
  it('is true once the part has had as many coats as reach the step', () => {
    expect(repeatsStep([7], primer, steps, ready(1), [])).toBe(true);
    expect(repeatsStep([7], topcoat, steps, ready(2), [])).toBe(true);
  });
  it('counts a coat at that step earlier in this session, but not a replaced record', () => {
    expect(repeatsStep([8], topcoat, steps, new Map(), [coatAt(2)])).toBe(true);
    expect(repeatsStep([8], topcoat, steps, new Map(), [coatAt(2, 99)])).toBe(false);
    expect(repeatsStep([8], topcoat, steps, new Map(), [coatAt(0)])).toBe(false);
  });
  it('is false with no step chosen', () => expect(repeatsStep([7], undefined, steps, ready(2), [coatAt(2)])).toBe(false));
});
