import fs from 'node:fs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { simplePdf } from '../../../server/db/demo-pdf';
import { demo, signIn, startTestApp, type TestContext } from '../../helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await startTestApp();
});
afterAll(async () => ctx.close());

const row = { tempC: 20, flashOffMin: 10, recoatMinMin: 60, recoatMaxMin: 600, touchDryMin: 20, handleMin: 90, packMin: 300, fullCureH: 168 };
const newProduct = { name: 'Test 2K Clear', kind: 'clear', chemistry: 'two-component-polyurethane', volumeSolidsPct: 40, dryingTimes: [row, { ...row, tempC: 10, flashOffMin: 20, recoatMinMin: 120, recoatMaxMin: 1200, touchDryMin: 40, handleMin: 180, packMin: 600, fullCureH: 336 }] };

describe('POST /api/products', () => {
  it('lets a lead create a data sheet with two drying rows and fills defaults', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const res = await agent.post('/api/products').set('x-csrf-token', csrf).send(newProduct).expect(201);
    expect(res.body.product).toMatchObject({ name: 'Test 2K Clear', hazards: [], lots: [], tdsFile: null, mixBaseParts: 1, mixHardenerParts: 0 });
    expect(res.body.product.dryingTimes).toHaveLength(2);
  });

  it('answers 400 naming the field when recoat maximum is below recoat minimum', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const res = await agent.post('/api/products').set('x-csrf-token', csrf).send({ ...newProduct, dryingTimes: [{ ...row, recoatMaxMin: 30 }] }).expect(400);
    expect(res.body.error.fields).toHaveProperty(['dryingTimes.0.recoatMaxMin']);
  });

  it('answers 400 when a colder row dries faster than a warmer one', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const colderButFaster = { ...row, tempC: 10, handleMin: 60 };
    const res = await agent.post('/api/products').set('x-csrf-token', csrf).send({ ...newProduct, dryingTimes: [row, colderButFaster] }).expect(400);
    expect(Object.keys(res.body.error.fields)[0]).toMatch(/^dryingTimes\.1\./);
  });

  it('answers 400 for solids outside 1–100 % and a missing drying table', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const res = await agent.post('/api/products').set('x-csrf-token', csrf).send({ ...newProduct, volumeSolidsPct: 0, dryingTimes: [] }).expect(400);
    expect(res.body.error.fields).toHaveProperty('volumeSolidsPct');
    expect(res.body.error.fields).toHaveProperty('dryingTimes');
  });

  it('lets a sprayer read data sheets but not write them, and keeps them from an assembler', async () => {
    const sprayer = await signIn(ctx.app, demo.sprayer);
    await sprayer.agent.get('/api/products').expect(200);
    await sprayer.agent.post('/api/products').set('x-csrf-token', sprayer.csrf).send(newProduct).expect(403);
    const assembler = await signIn(ctx.app, demo.assembler);
    await assembler.agent.get('/api/products').expect(403);
  });
});

describe('the thinning range', () => {
  it('is "not given" when left out or blank, "do not thin" at 0–0 %, and can be cleared again', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const create = async (name: string, extra: object) => (await agent.post('/api/products').set('x-csrf-token', csrf).send({ ...newProduct, name, ...extra }).expect(201)).body.product;
    expect(await create('No range', {})).toMatchObject({ thinnerMinPct: 0, thinnerMaxPct: 0, thinningRangeGiven: false });
    expect(await create('Blank range', { thinnerMinPct: null, thinnerMaxPct: null })).toMatchObject({ thinningRangeGiven: false });
    expect(await create('Do not thin', { thinnerMinPct: 0, thinnerMaxPct: 0 })).toMatchObject({ thinnerMinPct: 0, thinnerMaxPct: 0, thinningRangeGiven: true });
    const upTo = await create('Up to 10', { thinnerMaxPct: 10 });
    expect(upTo).toMatchObject({ thinnerMinPct: 0, thinnerMaxPct: 10, thinningRangeGiven: true });
    const cleared = await agent.patch(`/api/products/${upTo.id}`).set('x-csrf-token', csrf).send({ thinnerMinPct: null, thinnerMaxPct: null }).expect(200);
    expect(cleared.body.product).toMatchObject({ thinnerMinPct: 0, thinnerMaxPct: 0, thinningRangeGiven: false });
    const untouched = await agent.patch(`/api/products/${upTo.id}`).set('x-csrf-token', csrf).send({ makerRef: 'X-1' }).expect(200);
    expect(untouched.body.product).toMatchObject({ makerRef: 'X-1', thinningRangeGiven: false });
    const again = await agent.patch(`/api/products/${upTo.id}`).set('x-csrf-token', csrf).send({ thinnerMinPct: 5, thinnerMaxPct: 15 }).expect(200);
    expect(again.body.product).toMatchObject({ thinnerMinPct: 5, thinnerMaxPct: 15, thinningRangeGiven: true });
  });

  it('answers 400 on the most thinner when only the least is given, or the most is below it', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const half = await agent.post('/api/products').set('x-csrf-token', csrf).send({ ...newProduct, name: 'Half range', thinnerMinPct: 5 }).expect(400);
    expect(half.body.error.fields.thinnerMaxPct).toMatch(/leave both blank/);
    const backwards = await agent.post('/api/products').set('x-csrf-token', csrf).send({ ...newProduct, name: 'Backwards', thinnerMinPct: 10, thinnerMaxPct: 5 }).expect(400);
    expect(backwards.body.error.fields.thinnerMaxPct).toMatch(/cannot be less than the least/);
  });
});

describe('GET /api/products', () => {
  it('searches, sorts and pages on the server', async () => {
    const { agent } = await signIn(ctx.app, demo.sprayer);
    const found = await agent.get('/api/products?q=aqua&sort=name&dir=desc').expect(200);
    expect(found.body.items.map((p: { name: string }) => p.name)).toEqual(['Kestrel AquaTop WB Topcoat Satin', 'Kestrel AquaPrime WB primer']);
    const page = await agent.get('/api/products?pageSize=3&page=2').expect(200);
    expect(page.body).toMatchObject({ page: 2, pageSize: 3 });
    expect(page.body.items).toHaveLength(3);
    expect(page.body.total).toBeGreaterThanOrEqual(8);
  });

  it('flags the demo lot that is past its date', async () => {
    const { agent } = await signIn(ctx.app, demo.lead);
    const res = await agent.get('/api/products?q=topcoat satin&pageSize=5').expect(200);
    const lots = res.body.items.flatMap((p: { lots: { expired: boolean }[] }) => p.lots);
    expect(lots.some((l: { expired: boolean }) => l.expired)).toBe(true);
    expect(lots.some((l: { expired: boolean }) => !l.expired)).toBe(true);
  });
});

describe('lots and data-sheet files', () => {
  it('adds a lot and answers 409 for the same lot number twice', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const res = await agent.post('/api/products/1/lots').set('x-csrf-token', csrf).send({ lotNumber: 'T-1', expiresOn: '2020-01-01' }).expect(201);
    expect(res.body.lot).toMatchObject({ lotNumber: 'T-1', expired: true });
    await agent.post('/api/products/1/lots').set('x-csrf-token', csrf).send({ lotNumber: 'T-1' }).expect(409);
  });

  it('accepts a PDF, stores it under a generated name and serves it back with the original name', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const pdf = simplePdf('Test sheet', ['line']);
    const res = await agent.post('/api/products/1/documents').set('x-csrf-token', csrf).field('kind', 'sds').attach('file', pdf, '../../etc/passwd.pdf').expect(201);
    const file = res.body.product.sdsFile;
    expect(file.originalName).toBe('passwd.pdf');
    expect(fs.readdirSync(ctx.config.uploadDir).every((name) => /^[0-9a-f-]{36}\.pdf$/.test(name))).toBe(true);
    const download = await agent.get(`/api/files/${file.id}`).expect(200);
    expect(download.headers['content-disposition']).toContain('passwd.pdf');
    expect(download.headers['content-type']).toContain('application/pdf');
    expect(Buffer.from(download.body).subarray(0, 5).toString()).toBe('%PDF-');
  });

  it('keeps a file name in any script as typed, and gives it back in the download', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const name = 'Fiche de données de sécurité – Łódź 安全.pdf';
    const res = await agent.post('/api/products/1/documents').set('x-csrf-token', csrf).field('kind', 'sds').attach('file', simplePdf('Fiche', ['ligne']), name).expect(201);
    expect(res.body.product.sdsFile.originalName).toBe(name);
    const download = await agent.get(`/api/files/${res.body.product.sdsFile.id}`).expect(200);
    expect(download.headers['content-disposition']).toContain(`filename*=UTF-8''${encodeURIComponent(name)}`);
  });

  it('never keeps a direction override that could disguise the extension', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const res = await agent.post('/api/products/1/documents').set('x-csrf-token', csrf).field('kind', 'sds').attach('file', simplePdf('Sheet', ['line']), 'sheet\u202Efdp.exe.pdf').expect(201);
    expect(res.body.product.sdsFile.originalName).toBe('sheetfdp.exe.pdf');
  });

  it('refuses a file that is not a PDF whatever its name says', async () => {
    const { agent, csrf } = await signIn(ctx.app, demo.lead);
    const res = await agent.post('/api/products/1/documents').set('x-csrf-token', csrf).field('kind', 'tds').attach('file', Buffer.from('MZ not a pdf'), 'sheet.pdf').expect(400);
    expect(res.body.error.fields.file).toMatch(/PDF/);
  });

  it('refuses a download without a sign-in', async () => {
    await request(ctx.app).get('/api/files/1').expect(401);
  });
});
