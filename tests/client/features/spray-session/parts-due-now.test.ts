import { describe, expect, it } from 'vitest';
import type { FinishSystem } from '../../../../shared/schemas/finish-system';
import type { Part } from '../../../../shared/schemas/part';
import type { ReadyPart } from '../../../../shared/schemas/ready';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { partsDueNow, suggestedStep, type FinishWork } from '../../../../src/features/spray-session/utils/session-plan';

// Primer at 0, denib at 1, two topcoats at 2 and 3.
const system = {
  id: 1,
  steps: [
    { kind: 'coat', position: 0, productId: 1, productName: 'Primer', dryFilmUm: 60 },
    { kind: 'abrade', position: 1, grit: 'P320' },
    { kind: 'coat', position: 2, productId: 2, productName: 'Topcoat', dryFilmUm: 40 },
    { kind: 'coat', position: 3, productId: 2, productName: 'Topcoat', dryFilmUm: 40 },
  ],
} as FinishSystem;
const part = (id: number) => ({ id, jobId: 5 }) as Part;
const work = (coatsDone: Record<number, number>): FinishWork => ({
  systemByJob: new Map([[5, system]]),
  products: new Map(),
  ready: new Map(Object.entries(coatsDone).map(([id, done]) => [Number(id), { id: Number(id), coatsDone: done } as ReadyPart])),
});
const session = (items: { partId: number; stepPosition: number | null }[]) => ({ items }) as SpraySession;

describe('partsDueNow', () => {
  it('takes the planned parts whose next coat is the planned step', () => {
    const planned = session([{ partId: 1, stepPosition: 2 }, { partId: 2, stepPosition: 2 }, { partId: 3, stepPosition: 2 }]);
    // Part 1 had the primer: topcoat 1 is next. Part 2 had the topcoat already. Part 3 has had nothing.
    expect(partsDueNow(planned, [part(1), part(2), part(3)], work({ 1: 1, 2: 2, 3: 0 }), [])).toEqual([1]);
  });

  it('leaves out a part that has just had the step in this session, even before its readiness catches up', () => {
    const planned = session([{ partId: 1, stepPosition: 0 }, { partId: 2, stepPosition: 0 }]);
    const coats = [{ partIds: [1], stepPosition: 0 }];
    expect(partsDueNow(planned, [part(1), part(2)], work({ 1: 0, 2: 0 }), coats)).toEqual([2]);
  });

  it('for "its next coat", takes the part until it has had a coat here', () => {
    const planned = session([{ partId: 1, stepPosition: null }]);
    expect(partsDueNow(planned, [part(1)], work({ 1: 1 }), [])).toEqual([1]);
    expect(partsDueNow(planned, [part(1)], work({ 1: 2 }), [{ partIds: [1], stepPosition: 2 }])).toEqual([]);
  });

  it('takes nothing from a part with every coat on, or with no finish system', () => {
    const planned = session([{ partId: 1, stepPosition: 3 }, { partId: 9, stepPosition: 0 }]);
    expect(partsDueNow(planned, [part(1), { id: 9, jobId: 77 } as Part], work({ 1: 3 }), [])).toEqual([]);
  });
});

describe('suggestedStep', () => {
  const ready = (coatsDone: number) => ({ coatsDone }) as ReadyPart;
  it('starts on the step planned here while the part has not had it', () => {
    expect(suggestedStep(0, system, ready(0))).toBe(0);
    expect(suggestedStep(3, system, ready(1))).toBe(3);
  });
  it('moves on to the part’s next coat once it has had the planned one, for a second coat in the same session', () => {
    // Primer on and denibbed: the topcoat (position 2) is next, not the primer again.
    expect(suggestedStep(0, system, ready(1))).toBe(2);
  });
  it('keeps the planned step when the part has had every coat (a re-spray is chosen by hand)', () => {
    expect(suggestedStep(3, system, ready(3))).toBe(3);
  });
  it('takes the next coat when nothing is planned', () => {
    expect(suggestedStep(null, system, ready(2))).toBe(3);
  });
});
