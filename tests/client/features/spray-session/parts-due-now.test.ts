import { describe, expect, it } from 'vitest';
import type { FinishSystem } from '../../../../shared/schemas/finish-system';
import type { Part } from '../../../../shared/schemas/part';
import type { ReadyPart } from '../../../../shared/schemas/ready';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { partsDueNow, type FinishWork } from '../../../../src/features/spray-session/utils/session-plan';

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
