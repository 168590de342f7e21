import { In } from 'typeorm';
import { sprayerRoles, type Sprayer, type SprayerQuery } from '../../shared/schemas/sprayer';
import type { SiteData } from '../data/site-data';
import type { BoothEntity } from '../db/entities/booth.entity';
import type { UserEntity } from '../db/entities/user.entity';
import { AppError } from '../lib/app-error';

const isSprayerRole = (role: string): role is Sprayer['role'] => (sprayerRoles as readonly string[]).includes(role);

function toSprayerDto(user: UserEntity): Sprayer {
  return { id: user.id, name: user.name, role: isSprayerRole(user.role) ? user.role : 'sprayer', siteId: user.siteId };
}

/**
 * Who may be given a session in a booth: active sprayers and leads of the booth's own site. A
 * sprayer of another site cannot walk into this booth, and one who is disabled no longer works here.
 */
export async function assertSprayerFor(tx: SiteData, sprayerId: number | null | undefined, booth: BoothEntity): Promise<void> {
  if (!sprayerId) return;
  const user = await tx.forSite(booth.siteId).users.findOneBy({ id: sprayerId });
  if (!user || user.disabled || !isSprayerRole(user.role)) {
    throw new AppError('validation_failed', `Choose an active sprayer or lead of ${booth.name}’s site`, { sprayerId: 'Choose an active sprayer of this booth’s site' });
  }
}

/** Who can be given a spray session: active sprayers and leads of a booth's site, or of the sites the caller sees. */
export function createSprayerService(data: SiteData) {
  /** The people of one booth's site; a booth of another site is, to a lead, a booth that does not exist. */
  async function peopleOf(boothId: number | undefined): Promise<SiteData> {
    if (!boothId) return data;
    const booth = await data.booths.findOneBy({ id: boothId });
    if (!booth) throw new AppError('validation_failed', 'That booth does not exist', { boothId: 'Choose a booth' });
    return data.forSite(booth.siteId);
  }

  return {
    async list(query: SprayerQuery = {}): Promise<Sprayer[]> {
      const people = await peopleOf(query.boothId);
      const users = await people.users.find({ where: { role: In([...sprayerRoles]), disabled: false }, order: { name: 'ASC', id: 'ASC' } });
      return users.map(toSprayerDto);
    },
  };
}

export type SprayerService = ReturnType<typeof createSprayerService>;
