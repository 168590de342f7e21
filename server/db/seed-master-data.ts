import type { DataSource } from 'typeorm';
import { openSiteData } from '../data/site-data';
import { everySite } from '../lib/site-scope';
import type { FinishStepInput } from '../../shared/schemas/finish-system';
import { calendarDateIn } from '../../shared/time';
import { systemActor } from '../services/audit';
import type { FileStorage } from '../services/file-storage';
import { createFileService } from '../services/files';
import { createFinishSystemService } from '../services/finish-systems';
import { createJobService } from '../services/jobs';
import { createPartService } from '../services/parts';
import { createProductService } from '../services/products';
import { createSettingsService } from '../services/settings';
import { demoJobs, demoFinishSystems } from './demo-jobs';
import { simplePdf } from './demo-pdf';
import { demoProducts } from './demo-products';

const dayMs = 24 * 60 * 60 * 1000;

async function seedProducts(dataSource: DataSource, storage: FileStorage | string): Promise<Map<string, number>> {
  const settings = createSettingsService(openSiteData(dataSource, everySite));
  const products = createProductService(openSiteData(dataSource, everySite), createFileService(openSiteData(dataSource, everySite), storage), settings);
  const ids = new Map<string, number>();
  const today = Date.now();
  for (const [index, input] of demoProducts.entries()) {
    const product = await products.create(input, systemActor);
    ids.set(product.name, product.id);
    await products.addLot(product.id, { lotNumber: `L${2611 + index}-A`, expiresOn: calendarDateIn(new Date(today + 200 * dayMs), 'UTC') }, systemActor);
    // One lot past its date, so the "expired lot" warning can be seen in the demo.
    if (index === 3) await products.addLot(product.id, { lotNumber: `L2503-${index}`, expiresOn: calendarDateIn(new Date(today - 20 * dayMs), 'UTC') }, systemActor);
  }
  const topcoat = 'Kestrel 2K PU Topcoat Satin';
  const sheet = simplePdf(`${topcoat}: technical data sheet (demo)`, [
    'Invented product for the Boothwright demo shop. Not a real data sheet.',
    'Mix 4 : 1 with KF hardener by volume; thin 10-25 % with KF thinner.',
    'Pot life 3 h at 23 C. Recoat after 3 h, within 48 h at 23 C; after that, abrade P320.',
    'Dry to handle 4 h, stack 12 h, full cure 7 days at 23 C.',
    'Contains isocyanate: air-fed respiratory protection. Read the safety data sheet.',
  ]);
  await products.attachDocument(ids.get(topcoat)!, 'tds', { originalname: 'kestrel-pu-topcoat-tds.pdf', buffer: sheet, size: sheet.length }, systemActor);
  return ids;
}

async function seedFinishSystems(dataSource: DataSource, productIds: Map<string, number>): Promise<Map<string, number>> {
  const systems = createFinishSystemService(openSiteData(dataSource, everySite));
  const ids = new Map<string, number>();
  for (const system of demoFinishSystems) {
    const steps: FinishStepInput[] = system.steps.map((s) => ('grit' in s ? { kind: 'abrade', grit: s.grit } : { kind: 'coat', productId: productIds.get(s.product)!, dryFilmUm: s.dryFilmUm }));
    const created = await systems.create({ name: system.name, description: system.description, steps }, systemActor);
    ids.set(created.name, created.id);
  }
  return ids;
}

async function seedJobs(dataSource: DataSource, systemIds: Map<string, number>, timezone: string): Promise<void> {
  const jobs = createJobService(openSiteData(dataSource, everySite));
  const parts = createPartService(openSiteData(dataSource, everySite));
  for (const { job, parts: jobParts } of demoJobs) {
    const { dueInDays, finishSystem, ...fields } = job;
    const created = await jobs.create({ ...fields, dueDate: calendarDateIn(new Date(Date.now() + dueInDays * dayMs), timezone), finishSystemId: systemIds.get(finishSystem)! }, systemActor);
    if (jobParts.length) await parts.createMany(created.id, jobParts, systemActor);
  }
}

/** Data sheets, finish systems and a job book for the demo shop. */
export async function seedMasterData(dataSource: DataSource, storage: FileStorage | string, timezone: string): Promise<void> {
  const productIds = await seedProducts(dataSource, storage);
  const systemIds = await seedFinishSystems(dataSource, productIds);
  await seedJobs(dataSource, systemIds, timezone);
}
