import type { DataSource } from 'typeorm';
import { openSiteData } from '../../server/data/site-data';
import { everySite } from '../../server/lib/site-scope';
import type { DryingRow } from '../../shared/finishing/drying-row-schema';
import type { FinishStepInput } from '../../shared/schemas/finish-system';
import { openDataSource } from '../../server/db/data-source';
import { demoPassword, seedDemoShop } from '../../server/db/seed';
import { systemActor } from '../../server/services/audit';
import { createBoothService } from '../../server/services/booths';
import { createFinishSystemService } from '../../server/services/finish-systems';
import { EventBus } from '../../server/services/events';
import { createUserService } from '../../server/services/users';
import { defaultOpeningHours } from '../../shared/schemas/booth';

/** A coat step of a bench finish system, with what the bulk seed needs to write its coats. */
export interface BenchCoatStep {
  position: number;
  productId: number;
  lotId: number | null;
  dryFilmUm: number;
  volumeSolidsPct: number;
  dryingTimes: DryingRow[];
}

export interface BenchSystem {
  id: number;
  coats: BenchCoatStep[];
}

export interface RackRef {
  id: number;
  shelves: number;
  dryingTempC: number | null;
}

/** Ids of the master data the synthetic volume points at, and where each table's ids may start. */
export interface ShopRefs {
  boothIds: number[];
  racks: RackRef[];
  sprayers: { id: number; name: string }[];
  systems: BenchSystem[];
  nextId: Record<'jobs' | 'parts' | 'spray_sessions' | 'spray_session_items' | 'coats' | 'readings', number>;
}

// Two four-coat and two six-coat systems: on average a part takes five coats, as the volume plan assumes.
const benchSystems: { name: string; steps: ({ product: string; dryFilmUm: number } | { grit: string })[] }[] = [
  { name: 'Bench: painted MDF, 2K PU four-coat', steps: [{ product: 'Kestrel 2K PU Primer White', dryFilmUm: 60 }, { product: 'Kestrel 2K PU Primer White', dryFilmUm: 60 }, { grit: 'P320' }, { product: 'Kestrel 2K PU Topcoat Satin', dryFilmUm: 40 }, { product: 'Kestrel 2K PU Topcoat Satin', dryFilmUm: 40 }] },
  { name: 'Bench: clear oak, six-coat precat', steps: [{ product: 'Kestrel Sanding Sealer NC', dryFilmUm: 25 }, { product: 'Kestrel Sanding Sealer NC', dryFilmUm: 25 }, { grit: 'P320' }, { product: 'Kestrel Precat Clear Matt', dryFilmUm: 30 }, { product: 'Kestrel Precat Clear Matt', dryFilmUm: 30 }, { grit: 'P400' }, { product: 'Kestrel Precat Clear Matt', dryFilmUm: 30 }, { product: 'Kestrel Precat Clear Matt', dryFilmUm: 30 }] },
  { name: 'Bench: water-borne painted four-coat', steps: [{ product: 'Kestrel AquaPrime WB primer', dryFilmUm: 40 }, { product: 'Kestrel AquaPrime WB primer', dryFilmUm: 40 }, { grit: 'P320' }, { product: 'Kestrel AquaTop WB Topcoat Satin', dryFilmUm: 35 }, { product: 'Kestrel AquaTop WB Topcoat Satin', dryFilmUm: 35 }] },
  { name: 'Bench: 2K acrylic gloss six-coat', steps: [{ product: 'Kestrel UV Sealer 100', dryFilmUm: 50 }, { product: 'Kestrel UV Sealer 100', dryFilmUm: 50 }, { grit: 'P400' }, { product: 'Kestrel 2K Acrylic Clear Gloss', dryFilmUm: 40 }, { product: 'Kestrel 2K Acrylic Clear Gloss', dryFilmUm: 40 }, { product: 'Kestrel 2K Acrylic Clear Gloss', dryFilmUm: 40 }, { product: 'Kestrel 2K Acrylic Clear Gloss', dryFilmUm: 40 }] },
];

async function addBoothSprayersAndSystems(dataSource: DataSource): Promise<void> {
  await createBoothService(openSiteData(dataSource, everySite)).create(
    { name: 'Booth 3 (down-draft)', kind: 'down-draft', volumeM3: 90, extractionM3PerH: 27000, mixingFactorK: 3, openFaceAreaM2: 15, minFaceVelocityMps: 0.4, sprayRateM2PerH: 20, openingHours: defaultOpeningHours },
    systemActor,
  );
  const users = createUserService(openSiteData(dataSource, everySite), new EventBus());
  for (const [email, name] of [['sprayer2@larchmere.test', 'Ola Brennan'], ['sprayer3@larchmere.test', 'Sam Dwyer']]) {
    await users.create({ email, name, role: 'sprayer', password: demoPassword }, systemActor);
  }
  const products = new Map((await dataSource.query('SELECT id, name FROM products') as { id: number; name: string }[]).map((p) => [p.name, p.id]));
  const systems = createFinishSystemService(openSiteData(dataSource, everySite));
  for (const system of benchSystems) {
    const steps: FinishStepInput[] = system.steps.map((s) => ('grit' in s ? { kind: 'abrade', grit: s.grit } : { kind: 'coat', productId: products.get(s.product)!, dryFilmUm: s.dryFilmUm }));
    await systems.create({ name: system.name, description: 'Made by npm run bench.', steps }, systemActor);
  }
}

async function benchSystemRefs(dataSource: DataSource): Promise<BenchSystem[]> {
  const rows: { system_id: number; position: number; product_id: number; dry_film_um: number; volume_solids_pct: number; drying_times: string; lot_id: number | null }[] = await dataSource.query(
    `SELECT fs.id AS system_id, st.position, st.product_id, st.dry_film_um, p.volume_solids_pct, p.drying_times,
            (SELECT MAX(l.id) FROM product_lots l WHERE l.product_id = p.id) AS lot_id
       FROM finish_systems fs JOIN finish_steps st ON st.finish_system_id = fs.id JOIN products p ON p.id = st.product_id
      WHERE fs.name LIKE 'Bench:%' AND st.kind = 'coat' ORDER BY fs.id, st.position`,
  );
  const systems = new Map<number, BenchCoatStep[]>();
  for (const r of rows) {
    const coats = systems.get(r.system_id) ?? [];
    coats.push({ position: r.position, productId: r.product_id, lotId: r.lot_id, dryFilmUm: r.dry_film_um, volumeSolidsPct: r.volume_solids_pct, dryingTimes: JSON.parse(r.drying_times) as DryingRow[] });
    systems.set(r.system_id, coats);
  }
  return [...systems.entries()].map(([id, coats]) => ({ id, coats }));
}

async function nextIds(dataSource: DataSource): Promise<ShopRefs['nextId']> {
  const tables = ['jobs', 'parts', 'spray_sessions', 'spray_session_items', 'coats', 'readings'] as const;
  const entries = await Promise.all(tables.map(async (t) => [t, Number((await dataSource.query(`SELECT COALESCE(MAX(id), 0) AS m FROM ${t}`))[0].m) + 1] as const));
  return Object.fromEntries(entries) as ShopRefs['nextId'];
}

/** A fresh database made by the project's own migrations, with the demo shop seeded the normal way. */
export async function seedBaseShop(databasePath: string, uploadDir: string): Promise<ShopRefs> {
  const dataSource = await openDataSource({ kind: 'sqlite', path: databasePath }, { migrate: true });
  try {
    await seedDemoShop(dataSource, { uploadDir });
    await addBoothSprayersAndSystems(dataSource);
    const booths: { id: number }[] = await dataSource.query('SELECT id FROM booths ORDER BY id');
    const racks: { id: number; shelves: number; drying_temp_c: number | null }[] = await dataSource.query('SELECT id, shelves, drying_temp_c FROM racks ORDER BY id');
    const sprayers: { id: number; name: string }[] = await dataSource.query("SELECT id, name FROM users WHERE role = 'sprayer' ORDER BY id");
    return {
      boothIds: booths.map((b) => b.id),
      racks: racks.map((r) => ({ id: r.id, shelves: r.shelves, dryingTempC: r.drying_temp_c })),
      sprayers,
      systems: await benchSystemRefs(dataSource),
      nextId: await nextIds(dataSource),
    };
  } finally {
    await dataSource.destroy();
  }
}
