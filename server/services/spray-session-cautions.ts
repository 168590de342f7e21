import { respiratorLevel, sessionCautions, type Caution } from '../../shared/finishing/cautions';
import type { FitnessFinding } from '../../shared/finishing/fitness';
import type { SignedInUser } from '../../shared/schemas/auth';
import type { SiteData } from '../data/site-data';
import { notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import { toBoothDto } from './booths';
import { fitnessOf, seesCrewOf } from './fitness';
import type { SettingsService } from './settings';
import { spraySessionProducts } from './spray-session-products';

const fitnessCaution = (finding: FitnessFinding): Caution => ({
  code: `fitness-${finding.code}`,
  title: `${finding.severity === 'stop' ? 'Not fit to spray' : 'Fit to spray: check'} (${finding.subject === 'booth' ? 'booth upkeep' : 'sprayer’s records'})`,
  message: `${finding.message} ${finding.rule}`,
});

/**
 * Cautions worked out on the server, so every role sees them (assemblers cannot read data sheets):
 * the products' and booth's, then whatever keeps the booth or the sprayer from being fit to spray,
 * then the line that defers to the safety data sheet. The sprayer's part is left out for a viewer
 * who may not see their records.
 */
export function createSpraySessionCautionService(data: SiteData, settings: SettingsService, clock: Clock = systemClock) {
  return {
    async forSpraySession(id: number, viewer: Pick<SignedInUser, 'id' | 'role'> | null = null) {
      const spraySession = await data.spraySessions.findOneBy({ id });
      const booth = spraySession && (await data.booths.findOneBy({ id: spraySession.boothId }));
      if (!spraySession || !booth) throw notFound('Spray session');
      const products = await spraySessionProducts(data, id);
      const assess = await fitnessOf(data, spraySession, booth, products, await settings.get(), clock.now(), seesCrewOf(viewer, spraySession));
      const cautions = sessionCautions(products, toBoothDto(booth));
      const fitness = assess(respiratorLevel(products)).findings.map(fitnessCaution);
      return {
        products: products.map((p) => ({ name: p.name, chemistry: p.chemistry, hazards: p.hazards })),
        cautions: [...cautions.slice(0, -1), ...fitness, ...cautions.slice(-1)],
      };
    },
  };
}

export type SpraySessionCautionService = ReturnType<typeof createSpraySessionCautionService>;
