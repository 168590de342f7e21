import type { DataSource } from 'typeorm';
import { openSiteData } from '../data/site-data';
import { everySite } from '../lib/site-scope';
import { defaultOpeningHours, type CreateBoothInput } from '../../shared/schemas/booth';
import type { CreateRackInput } from '../../shared/schemas/rack';
import type { CreateUserInput } from '../../shared/schemas/user';
import { systemActor } from '../services/audit';
import { createBoothService } from '../services/booths';
import type { FileStorage } from '../services/file-storage';
import { createRackService } from '../services/racks';
import { createSettingsService } from '../services/settings';
import { EventBus } from '../services/events';
import { createUserService } from '../services/users';
import { UserEntity } from './entities/user.entity';
import { seedDemoUpkeep } from './demo-upkeep';
import { seedMasterData } from './seed-master-data';

/** An invented shop. The password is printed at start and in the README; change it for real use. */
export const demoPassword = 'finish-demo-2026';

export const demoUsers: CreateUserInput[] = [
  { email: 'owner@larchmere.test', name: 'Ros Halloran', role: 'admin', password: demoPassword },
  { email: 'lead@larchmere.test', name: 'Dev Okafor', role: 'lead', password: demoPassword },
  { email: 'sprayer@larchmere.test', name: 'Mina Castell', role: 'sprayer', password: demoPassword },
  { email: 'assembler@larchmere.test', name: 'Tomasz Brill', role: 'assembler', password: demoPassword },
];

const demoBooths: CreateBoothInput[] = [
  // 6 m × 4 m × 3 m dry-filter cross-draft booth: 72 m³, about 0.5 m/s over a 4 m × 3 m face.
  { name: 'Booth 1 (cross-draft)', kind: 'cross-draft', volumeM3: 72, extractionM3PerH: 21600, mixingFactorK: 3, openFaceAreaM2: 12, minFaceVelocityMps: 0.5, sprayRateM2PerH: 24, openingHours: defaultOpeningHours },
  // A converted bay with wall extraction: larger, slower to clear, so its clearance time matters.
  { name: 'Back spray room', kind: 'spray-room', volumeM3: 150, extractionM3PerH: 9000, mixingFactorK: 5, minFaceVelocityMps: 0.4, sprayRateM2PerH: 14, openingHours: defaultOpeningHours },
];

const demoRacks: CreateRackInput[] = [
  { name: 'Rack A (drying room)', location: 'drying-room', shelves: 20, shelfAreaM2: 1.2, dryingTempC: 24 },
  { name: 'Rack B (drying room)', location: 'drying-room', shelves: 20, shelfAreaM2: 1.2, dryingTempC: 24 },
  { name: 'Trolley by booth 1', location: 'booth-side', shelves: 10, shelfAreaM2: 0.8, dryingTempC: null },
];

/** Seeds the demo shop only into an empty database; existing data is never touched. */
/** `storage` (when S3 is configured) takes the demo data sheet instead of `uploadDir`. */
export async function seedDemoShop(dataSource: DataSource, options: { uploadDir: string; storage?: FileStorage; now?: Date }): Promise<{ seeded: boolean }> {
  if ((await dataSource.getRepository(UserEntity).count()) > 0) return { seeded: false };
  // Seeding runs before any server holds a sign-in: nobody listens to its changes.
  const users = createUserService(openSiteData(dataSource, everySite), new EventBus());
  for (const user of demoUsers) await users.create(user, systemActor);
  await createSettingsService(openSiteData(dataSource, everySite)).update({ shopName: 'Larchmere Joinery', timezone: 'Europe/London', defaultUnits: 'metric', yearlySolventThresholdKg: 150 }, systemActor);
  const booths = createBoothService(openSiteData(dataSource, everySite));
  for (const booth of demoBooths) await booths.create(booth, systemActor);
  const racks = createRackService(openSiteData(dataSource, everySite));
  for (const rack of demoRacks) await racks.create(rack, systemActor);
  await seedMasterData(dataSource, options.storage ?? options.uploadDir, 'Europe/London');
  await seedDemoUpkeep(dataSource, options.now ?? new Date());
  return { seeded: true };
}

export function demoSignInLines(): string[] {
  return demoUsers.map((u) => `  ${u.role.padEnd(9)} ${u.email.padEnd(28)} ${demoPassword}`);
}
