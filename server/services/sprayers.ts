import { In, type DataSource, type EntityManager } from 'typeorm';
import { sprayerRoles, type Sprayer, type SprayerQuery } from '../../shared/schemas/sprayer';
import { BoothEntity } from '../db/entities/booth.entity';
import { UserEntity } from '../db/entities/user.entity';
import { AppError } from '../lib/app-error';
import { everySite, inScope, type SiteScope } from '../lib/site-scope';

const isSprayerRole = (role: string): role is Sprayer['role'] => (sprayerRoles as readonly string[]).includes(role);

function toSprayerDto(user: UserEntity): Sprayer {
  return { id: user.id, name: user.name, role: isSprayerRole(user.role) ? user.role : 'sprayer', siteId: user.siteId };
}

/** A booth of another site is, to a lead, a booth that does not exist. */
async function boothSite(manager: EntityManager, boothId: number, scope: SiteScope): Promise<number> {
  const booth = await manager.findOneBy(BoothEntity, { id: boothId });
  if (!booth || !inScope(scope, booth.siteId)) throw new AppError('validation_failed', 'That booth does not exist', { boothId: 'Choose a booth' });
  return booth.siteId;
}

/**
 * Who may be given a session in a booth: active sprayers and leads of the booth's own site. A
 * sprayer of another site cannot walk into this booth, and one who is disabled no longer works here.
 */
export async function assertSprayerFor(manager: EntityManager, sprayerId: number | null | undefined, booth: BoothEntity): Promise<void> {
  if (!sprayerId) return;
  const user = await manager.findOneBy(UserEntity, { id: sprayerId });
  if (!user || user.disabled || !isSprayerRole(user.role) || user.siteId !== booth.siteId) {
    throw new AppError('validation_failed', `Choose an active sprayer or lead of ${booth.name}’s site`, { sprayerId: 'Choose an active sprayer of this booth’s site' });
  }
}

export function createSprayerService(dataSource: DataSource) {
  return {
    async list(query: SprayerQuery, scope: SiteScope = everySite): Promise<Sprayer[]> {
      const manager = dataSource.manager;
      const siteId = query.boothId ? await boothSite(manager, query.boothId, scope) : scope.siteId;
      const users = await manager.find(UserEntity, {
        where: { role: In([...sprayerRoles]), disabled: false, ...(siteId === null ? {} : { siteId }) },
        order: { name: 'ASC', id: 'ASC' },
      });
      return users.map(toSprayerDto);
    },
  };
}

export type SprayerService = ReturnType<typeof createSprayerService>;
