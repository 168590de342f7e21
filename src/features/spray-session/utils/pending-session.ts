import { mixQuantities } from '../../../../shared/finishing/material';
import { mixTimes, potLifeReferenceTempC } from '../../../../shared/finishing/pot-life';
import type { ChecklistResult, Mix } from '../../../../shared/schemas/checklist';
import type { Product } from '../../../../shared/schemas/product';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import type { PendingWrite } from './write-queue';

type SessionWrite = Extract<PendingWrite, { kind: 'session' }>;
type MixWrite = Extract<PendingWrite, { kind: 'mix' }>;

export interface ShownSession {
  session: SpraySession;
  /** The checks shown are the ones kept on this tablet: the server has not judged them yet. */
  checksWaiting: boolean;
}

const keptBy = 'you, on this tablet';

function checksOf(write: SessionWrite, checklist: NonNullable<SessionWrite['body']['checklist']>): ChecklistResult {
  const verdict = write.verdict ?? {
    verdict: 'caution' as const,
    problems: ['Not judged yet: the server judges the checks when they are sent.'],
    notes: [],
  };
  return { ...checklist, ...verdict, completedAt: write.body.changedAt, completedByName: keptBy };
}

/**
 * The session as the page should show it while writes wait on the tablet: the checks, start and stop
 * made offline move it on, so the sprayer can go on working. The server's copy replaces it once sent.
 */
export function withPendingWrites(session: SpraySession, pending: PendingWrite[]): ShownSession {
  let shown = session;
  let checksWaiting = false;
  for (const write of pending) {
    if (write.kind !== 'session' || write.problem !== null) continue;
    const { checklist, state, changedAt } = write.body;
    if (checklist) {
      shown = { ...shown, checklist: checksOf(write, checklist) };
      checksWaiting = true;
    }
    if (state === 'planned' || state === 'checking' || state === 'spraying' || state === 'clearing' || state === 'done')
      shown = { ...shown, state, ...(state === 'clearing' ? { clearingStartedAt: changedAt } : {}) };
  }
  return { session: shown, checksWaiting };
}

/** A pot kept on the tablet, worked out with the same maths the server uses; its id is the stand-in one. */
function pendingMix(write: MixWrite, product: Product): Mix {
  const { wantedL, thinningPct = 0, tempC, mixedAt, lotIds = [] } = write.body;
  const quantities = mixQuantities({
    wantedL,
    ratio: { base: product.mixBaseParts, hardener: product.mixHardenerParts },
    thinningPct,
    thinnerBasis: 'on-mix',
  });
  const at = new Date(mixedAt);
  const times = product.potLifeMin
    ? mixTimes({
        mixedAt: at,
        inductionMin: product.inductionMin,
        potLifeMin: product.potLifeMin,
        refTempC: potLifeReferenceTempC(product.dryingTimes),
        tempC,
      })
    : null;
  return {
    id: write.localId,
    spraySessionId: write.spraySessionId,
    productId: product.id,
    productName: product.name,
    lotIds,
    ...quantities,
    totalL: quantities.baseL + quantities.hardenerL + quantities.thinnerL,
    mixedAt: at.toISOString(),
    tempC,
    inductionEndsAt: (times?.inductionEndsAt ?? at).toISOString(),
    potLifeEndsAt: times?.potLifeEndsAt.toISOString() ?? null,
    potLifeWarningAt: times?.potLifeWarningAt.toISOString() ?? null,
    recordedByName: keptBy,
  };
}

/** The pots waiting on the tablet whose data sheet is known, newest first like the server's list. */
export function pendingMixes(pending: PendingWrite[], products: Map<number, Product>): Mix[] {
  return pending
    .flatMap((write) => {
      const product = write.kind === 'mix' && write.problem === null ? products.get(write.body.productId) : undefined;
      return write.kind === 'mix' && product ? [pendingMix(write, product)] : [];
    })
    .reverse();
}
