import { In, type DataSource } from 'typeorm';
import { mixQuantities } from '../../shared/finishing/material';
import { mixTimes } from '../../shared/finishing/pot-life';
import { createMixSchema, type CreateMixInput, type Mix } from '../../shared/schemas/checklist';
import { MixEntity } from '../db/entities/mix.entity';
import { ProductLotEntity } from '../db/entities/product-lot.entity';
import { ProductEntity } from '../db/entities/product.entity';
import { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { inTransaction } from '../db/transaction';
import { AppError, notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import { assertHappenedNearNow } from '../lib/instant-window';
import { assertRunsSession, type SessionRunner } from './session-runner';

/** Pot life on a data sheet is quoted at its reference temperature: the row nearest 20 °C. */
export function potLifeReferenceTempC(product: ProductEntity): number {
  return [...product.dryingTimes].sort((a, b) => Math.abs(a.tempC - 20) - Math.abs(b.tempC - 20))[0].tempC;
}

function toMixDto(mix: MixEntity, productName: string): Mix {
  const { id, spraySessionId, productId, lotIds, baseL, hardenerL, thinnerL, mixedAt, tempC, inductionEndsAt, potLifeEndsAt, potLifeWarningAt, recordedByName } = mix;
  return { id, spraySessionId, productId, productName, lotIds, baseL, hardenerL, thinnerL, totalL: baseL + hardenerL + thinnerL, mixedAt, tempC, inductionEndsAt, potLifeEndsAt, potLifeWarningAt, recordedByName };
}

export function createMixService(dataSource: DataSource, clock: Clock = systemClock) {
  return {
    async create(spraySessionId: number, input: CreateMixInput, actor: SessionRunner): Promise<Mix> {
      const fields = createMixSchema.parse(input);
      assertHappenedNearNow(fields.mixedAt, 'mixedAt', clock.now());
      return inTransaction(dataSource, async (manager) => {
        if (!(await manager.existsBy(SpraySessionEntity, { id: spraySessionId }))) throw notFound('Spray session');
        await assertRunsSession(manager, spraySessionId, actor);
        const product = await manager.findOneBy(ProductEntity, { id: fields.productId });
        if (!product) throw new AppError('validation_failed', 'That product does not exist', { productId: 'Choose a product' });
        const lots = fields.lotIds.length ? await manager.findBy(ProductLotEntity, { id: In(fields.lotIds) }) : [];
        if (lots.length !== fields.lotIds.length || lots.some((l) => l.productId !== product.id)) throw new AppError('validation_failed', 'Choose lots of this product', { lotIds: 'Choose lots of this product' });
        const quantities = mixQuantities({ wantedL: fields.wantedL, ratio: { base: product.mixBaseParts, hardener: product.mixHardenerParts }, thinningPct: fields.thinningPct, thinnerBasis: 'on-mix' });
        const mixedAt = new Date(fields.mixedAt ?? clock.now());
        const times = product.potLifeMin
          ? mixTimes({ mixedAt, inductionMin: product.inductionMin, potLifeMin: product.potLifeMin, refTempC: potLifeReferenceTempC(product), tempC: fields.tempC })
          : null;
        const mix = await manager.save(
          manager.create(MixEntity, {
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
          }),
        );
        return toMixDto(mix, product.name);
      });
    },

    async list(spraySessionId: number): Promise<Mix[]> {
      const mixes = await dataSource.getRepository(MixEntity).find({ where: { spraySessionId }, order: { mixedAt: 'DESC' } });
      const products = await dataSource.getRepository(ProductEntity).find({ where: { id: In(mixes.map((m) => m.productId)) }, select: { id: true, name: true } });
      return mixes.map((m) => toMixDto(m, products.find((p) => p.id === m.productId)?.name ?? ''));
    },
  };
}

export type MixService = ReturnType<typeof createMixService>;
