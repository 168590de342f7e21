import { In } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openSiteData, type SiteData } from '../../../server/data/site-data';
import { everySite, oneSite } from '../../../server/lib/site-scope';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
let admin: SignedIn;
let firstBooth: number;
let secondBooth: number;
let secondSite: number;
let second: SiteData;

const post = (path: string, body: object) => admin.agent.post(path).set('x-csrf-token', admin.csrf).send(body);
const booth = (name: string, siteId: number) => ({ name, kind: 'cross-draft', volumeM3: 60, extractionM3PerH: 18000, siteId });

beforeAll(async () => {
  ctx = await startTestApp();
  admin = await signIn(ctx.app, demo.admin);
  secondSite = (await post('/api/sites', { name: 'Scoped data site' }).expect(201)).body.site.id;
  firstBooth = (await post('/api/booths', booth('First scoped booth', 1)).expect(201)).body.booth.id;
  secondBooth = (await post('/api/booths', booth('Second scoped booth', secondSite)).expect(201)).body.booth.id;
  second = openSiteData(ctx.dataSource, oneSite(secondSite));
});
afterAll(async () => ctx.close());

describe('SiteData seen from one site', () => {
  it('finds only that site’s rows, by id or in a list', async () => {
    expect(await second.booths.findOneBy({ id: firstBooth })).toBeNull();
    expect((await second.booths.findOneBy({ id: secondBooth }))?.name).toBe('Second scoped booth');
    expect((await second.booths.find()).map((b) => b.siteId)).toEqual([secondSite]);
    expect(await second.booths.countBy({ id: In([firstBooth, secondBooth]) })).toBe(1);
  });

  it('keeps alternatives inside the site limit, whether given as a list of wheres or a bracketed condition', async () => {
    const either = await second.booths.find({ where: [{ id: firstBooth }, { id: secondBooth }] });
    expect(either.map((b) => b.id)).toEqual([secondBooth]);
    const raw = await second.booths.select('b').where('b.id = :a OR b.id = :b', { a: firstBooth, b: secondBooth }).getMany();
    expect(raw.map((b) => b.id)).toEqual([secondBooth]);
  });

  it('refuses orWhere on a scoped query, which could reach past the site', () => {
    expect(() => second.booths.select('b').orWhere('b.id = :id', { id: firstBooth })).toThrow(/orWhere/);
  });

  it('refuses to write a row of another site, even one loaded across sites', async () => {
    const stolen = (await second.acrossSites.booths.findOneBy({ id: firstBooth }))!;
    stolen.name = 'Taken over';
    await expect(second.booths.save(stolen)).rejects.toMatchObject({ code: 'forbidden' });
    await expect(second.racks.save(second.racks.create({ name: 'Moved in', shelves: 1, shelfAreaM2: 1, siteId: 1, createdAt: '', updatedAt: '' }))).rejects.toMatchObject({ code: 'forbidden' });
    expect(await second.booths.update({ id: firstBooth }, { name: 'Taken over' })).toBe(0);
    expect((await openSiteData(ctx.dataSource, everySite).booths.findOneBy({ id: firstBooth }))?.name).toBe('First scoped booth');
  });

  it('limits a transaction to the same site', async () => {
    const seen = await second.transaction(async (tx) => (await tx.booths.find()).map((b) => b.id));
    expect(seen).toEqual([secondBooth]);
  });
});
