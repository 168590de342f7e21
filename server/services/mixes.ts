import { In } from 'typeorm';
import { mixQuantities } from '../../shared/finishing/material';
import { mixTimes, potLifeReferenceTempC } from '../../shared/finishing/pot-life';
import { createMixSchema, type CreateMixInput, type Mix } from '../../shared/schemas/checklist';
import type { SiteData } from '../data/site-data';
import type { MixEntity } from '../db/entities/mix.entity';
import { AppError, notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import { assertHappenedNearNow } from '../lib/instant-window';
import { assertRunsSpraySession, type SpraySessionRunner } from './spray-session-runner';
import { keyOfAnotherRecord, writeOnce, type Once } from './write-once';

type MixFields = ReturnType<typeof createMixSchema.parse>;

function toMixDto(mix: MixEntity, productName: string): Mix {
  const { id, spraySessionId, productId, lotIds, baseL, hardenerL, thinnerL, mixedAt, tempC, inductionEndsAt, potLifeEndsAt, potLifeWarningAt, recordedByName } = mix;
  return { id, spraySessionId, productId, productName, lotIds, baseL, hardenerL, thinnerL, totalL: baseL + hardenerL + thinnerL, mixedAt, tempC, inductionEndsAt, potLifeEndsAt, potLifeWarningAt, recordedByName };
}

/** Pots mixed for a spray session: its site's record, like the session's coats. */
export function createMixService(data: SiteData, clock: Clock = systemClock) {
  return {
    /** A pot resent with its idempotency key answers the pot already recorded. */
    async create(spraySessionId: number, input: CreateMixInput, actor: SpraySessionRunner): Promise<Once<Mix>> {
      const fields = createMixSchema.parse(input);
      return writeOnce(fields.idempotencyKey, earlier, () => write(spraySessionId, fields, actor));
    },

    async list(spraySessionId: number): Promise<Mix[]> {
      if (!(await data.spraySessions.existsBy({ id: spraySessionId }))) throw notFound('Spray session');
      return named(await data.mixes.find({ where: { spraySessionId }, order: { mixedAt: 'DESC' } }));
    },
  };

  async function named(mixes: MixEntity[]): Promise<Mix[]> {
    const products = await data.products.find({ where: { id: In(mixes.map((m) => m.productId)) }, select: { id: true, name: true } });
    return mixes.map((m) => toMixDto(m, products.find((p) => p.id === m.productId)?.name ?? ''));
  }

  async function earlier(idempotencyKey: string): Promise<Mix | null> {
    const existing = await data.acrossSites.mixes.findOneBy({ idempotencyKey });
    if (!existing) return null;
    if (!(await data.mixes.existsBy({ id: existing.id }))) throw keyOfAnotherRecord();
    return (await named([existing]))[0];
  }

  function write(spraySessionId: number, fields: MixFields, actor: SpraySessionRunner): Promise<Mix> {
    assertHappenedNearNow(fields.mixedAt, 'mixedAt', clock.now());
    return data.transaction(async (tx) => {
      if (!(await tx.spraySessions.existsBy({ id: spraySessionId }))) throw notFound('Spray session');
      await assertRunsSpraySession(tx, spraySessionId, actor);
      const product = await tx.products.findOneBy({ id: fields.productId });
      if (!product) throw new AppError('validation_failed', 'That product does not exist', { productId: 'Choose a product' });
      const lots = fields.lotIds.length ? await tx.lots.findBy({ id: In(fields.lotIds) }) : [];
      if (lots.length !== fields.lotIds.length || lots.some((l) => l.productId !== product.id)) throw new AppError('validation_failed', 'Choose lots of this product', { lotIds: 'Choose lots of this product' });
      const quantities = mixQuantities({ wantedL: fields.wantedL, ratio: { base: product.mixBaseParts, hardener: product.mixHardenerParts }, thinningPct: fields.thinningPct, thinnerBasis: 'on-mix' });
      const mixedAt = new Date(fields.mixedAt ?? clock.now());
      const times = product.potLifeMin
        ? mixTimes({ mixedAt, inductionMin: product.inductionMin, potLifeMin: product.potLifeMin, refTempC: potLifeReferenceTempC(product.dryingTimes), tempC: fields.tempC })
        : null;
      const mix = await tx.mixes.save(
        tx.mixes.create({
          spraySessionId,
          productId: product.id,
          lotIds: fields.lotIds,
          baseL: quantities.baseL,
          hardenerL: quantities.hardenerL,
          thinnerL: quantities.thinnerL,
          mixedAt: mixedAt.toISOString(),
          tempC: fields.tempC,
          inductionEndsAt: (times?.inductionEndsAt ?? mixedAt).toISOString(),
          potLifeEndsAt: times?.potLifeEndsAt.toISOString() ?? null,
          potLifeWarningAt: times?.potLifeWarningAt.toISOString() ?? null,
          recordedById: actor.id,
          recordedByName: actor.name,
          idempotencyKey: fields.idempotencyKey,
        }),
      );
      return toMixDto(mix, product.name);
    });
  }
}

export type MixService = ReturnType<typeof createMixService>;
