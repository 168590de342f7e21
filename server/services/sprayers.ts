import type { SiteData } from '../data/site-data';

/** Who can be given a spray session: active sprayers and leads of the sites the caller sees. */
export function createSprayerService(data: SiteData) {
  return {
    async list() {
      const users = await data.users.find({ where: [{ role: 'sprayer', disabled: false }, { role: 'lead', disabled: false }], order: { name: 'ASC' } });
      return users.map((u) => ({ id: u.id, name: u.name, role: u.role }));
    },
  };
}

export type SprayerService = ReturnType<typeof createSprayerService>;
