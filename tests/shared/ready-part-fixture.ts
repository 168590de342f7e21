import type { ReadyPart } from '../../shared/schemas/ready';

/** A part as the ready board answers it: Door 1 of LJ-26-105, drying after its last coat; override what a test needs. */
export function readyPart(fields: Partial<ReadyPart>): ReadyPart {
  return {
    id: 1,
    label: 'Door 1',
    jobId: 5,
    jobReference: 'LJ-26-105',
    customer: 'Ardent Bathrooms',
    state: 'drying',
    coatsDone: 3,
    coatsTotal: 3,
    nextStep: null,
    nextStepKind: null,
    nextStepGrit: null,
    nextStepDryFilmUm: null,
    nextWindowOpensAt: null,
    nextWindowClosesAt: null,
    abradeRequired: false,
    handleAt: '2026-12-02T10:42:00.000Z',
    packAt: '2026-12-02T16:00:00.000Z',
    fullCureAt: '2026-12-09T10:00:00.000Z',
    rack: { id: 1, name: 'Rack A', shelf: 3 },
    coatsRemaining: 0,
    nextCoatAt: null,
    expectedHandleAt: '2026-12-02T10:42:00.000Z',
    expectedPackAt: '2026-12-02T16:00:00.000Z',
    denibbedAt: null,
    collectedAt: null,
    collectedFrom: null,
    ...fields,
  };
}
