import { deferToSdsLine, respiratorLevel, type RespiratorLevel } from '../../shared/finishing/cautions';
import type { ChecklistProduct } from '../../shared/finishing/checklist';
import { assessFitness, type FitnessAssessment } from '../../shared/finishing/fitness';
import { can } from '../../shared/permissions';
import type { SignedInUser } from '../../shared/schemas/auth';
import type { ShopSettings } from '../../shared/schemas/settings';
import type { SessionFitness } from '../../shared/schemas/upkeep';
import type { SiteData } from '../data/site-data';
import type { BoothEntity } from '../db/entities/booth.entity';
import type { SpraySessionEntity } from '../db/entities/spray-session.entity';
import { notFound } from '../lib/app-error';
import { systemClock, type Clock } from '../lib/clock';
import type { SettingsService } from './settings';
import { spraySessionProducts } from './spray-session-products';
import { boothFacts, crewRecordsOf, shopDay, sprayerFacts } from './upkeep-facts';

const levels: RespiratorLevel[] = ['air-fed', 'vapour-and-particulate', 'particulate'];

/** Who may see the assigned sprayer's protection records in a session's fitness: the admin, a lead, the sprayer themself. */
export function seesCrewOf(viewer: Pick<SignedInUser, 'id' | 'role'> | null, spraySession: Pick<SpraySessionEntity, 'sprayerId'>): boolean {
  if (!viewer || spraySession.sprayerId === null) return true;
  return can(viewer.role, 'crew:status') || viewer.id === spraySession.sprayerId;
}

/**
 * The fit-to-spray assessment of a session for any respiratory protection: the booth's upkeep and
 * the assigned sprayer's records, as of now and of the session's day (whichever is later).
 */
export async function fitnessOf(
  data: SiteData,
  spraySession: SpraySessionEntity,
  booth: BoothEntity,
  products: ChecklistProduct[],
  shop: ShopSettings,
  now: Date,
  crewShown: boolean,
): Promise<(respirator: RespiratorLevel) => FitnessAssessment> {
  const today = shopDay(now, shop);
  const startDay = shopDay(new Date(spraySession.startAt), shop);
  const boothSide = await boothFacts(data, booth);
  const sprayerId = spraySession.sprayerId;
  const sprayer = !crewShown ? ('hidden' as const) : sprayerId === null ? null : sprayerFacts((await crewRecordsOf(data, [sprayerId])).get(sprayerId)!);
  const isocyanate = products.some((p) => p.hazards.includes('isocyanate'));
  return (respirator) =>
    assessFitness({ today, sessionDay: startDay > today ? startDay : today, dueSoonDays: shop.upkeepDueSoonDays, booth: boothSide, sprayer, respirator, isocyanate });
}

export function createFitnessService(data: SiteData, settings: SettingsService, clock: Clock = systemClock) {
  return {
    async forSpraySession(id: number, viewer: Pick<SignedInUser, 'id' | 'role'> | null): Promise<SessionFitness> {
      const spraySession = await data.spraySessions.findOneBy({ id });
      const booth = spraySession && (await data.booths.findOneBy({ id: spraySession.boothId }));
      if (!spraySession || !booth) throw notFound('Spray session');
      const products = await spraySessionProducts(data, id);
      const crewShown = seesCrewOf(viewer, spraySession);
      const assess = await fitnessOf(data, spraySession, booth, products, await settings.get(), clock.now(), crewShown);
      const byRespirator = Object.fromEntries(levels.map((level) => [level, assess(level)])) as SessionFitness['byRespirator'];
      return { spraySessionId: id, crewShown, neededRespirator: respiratorLevel(products), byRespirator, deferLine: deferToSdsLine };
    },
  };
}

export type FitnessService = ReturnType<typeof createFitnessService>;
