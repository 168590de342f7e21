import { sessionCautions } from '../../shared/finishing/cautions';
import type { SiteData } from '../data/site-data';
import { notFound } from '../lib/app-error';
import { toBoothDto } from './booths';
import { spraySessionProducts } from './spray-session-products';

/** Cautions worked out on the server, so every role sees them (assemblers cannot read data sheets). */
export function createSpraySessionCautionService(data: SiteData) {
  return {
    async forSpraySession(id: number) {
      const spraySession = await data.spraySessions.findOneBy({ id });
      const booth = spraySession && (await data.booths.findOneBy({ id: spraySession.boothId }));
      if (!spraySession || !booth) throw notFound('Spray session');
      const products = await spraySessionProducts(data, id);
      return {
        products: products.map((p) => ({ name: p.name, chemistry: p.chemistry, hazards: p.hazards })),
        cautions: sessionCautions(products, toBoothDto(booth)),
      };
    },
  };
}

export type SpraySessionCautionService = ReturnType<typeof createSpraySessionCautionService>;
