import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';
import { pngBytes } from '../security/fixtures';

let ctx: TestContext;
let admin: SignedIn;
let lead: SignedIn;
let mina: SignedIn;
let assembler: SignedIn;
let coatId: number;
let otherSessionCoatId: number;

const jpegBytes = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.alloc(64, 1)]);
const upload = (who: SignedIn, id: number, content: Buffer, name: string, fields: Record<string, string> = {}) => {
  let req = who.agent.post(`/api/coats/${id}/photos`).set('x-csrf-token', who.csrf);
  for (const [key, value] of Object.entries(fields)) req = req.field(key, value);
  return req.attach('file', content, name);
};

async function coatIn(sprayerId: number | null): Promise<number> {
  const job = (await lead.agent.get('/api/jobs?q=LJ-26-103')).body.items[0];
  const part = (await lead.agent.post(`/api/jobs/${job.id}/parts`).set('x-csrf-token', lead.csrf).send({ label: `Photo panel ${sprayerId}`, lengthMm: 600, widthMm: 300, thicknessMm: 18 }).expect(201)).body.part;
  const start = Date.now() - 30 * 60_000 + (sprayerId ?? 0) * 1000;
  const session = await lead.agent
    .post('/api/spray-sessions')
    .set('x-csrf-token', lead.csrf)
    .send({ boothId: sprayerId === null ? 2 : 1, start: new Date(start).toISOString(), end: new Date(start + 3_600_000).toISOString(), sprayerId, override: { reason: 'Test booking at any hour' } })
    .expect(201);
  const productId = (await lead.agent.get('/api/products?q=Sanding%20Sealer')).body.items[0].id;
  const coat = await lead.agent
    .post('/api/coats')
    .set('x-csrf-token', lead.csrf)
    .send({ spraySessionId: session.body.spraySession.id, partIds: [part.id], productId, sprayedAt: new Date(Date.now() - 60_000).toISOString(), airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19 })
    .expect(201);
  return coat.body.coat.id;
}

beforeAll(async () => {
  ctx = await startTestApp();
  [admin, lead, mina, assembler] = await Promise.all([signIn(ctx.app, demo.admin), signIn(ctx.app, demo.lead), signIn(ctx.app, demo.sprayer), signIn(ctx.app, demo.assembler)]);
  const minaId = (await mina.agent.get('/api/auth/me')).body.user.id;
  coatId = await coatIn(minaId);
  otherSessionCoatId = await coatIn(null);
});
afterAll(async () => ctx.close());

describe('photos of a coat', () => {
  it('takes a photo from the sprayer of the coat’s session, stored and read back byte for byte', async () => {
    const res = await upload(mina, coatId, jpegBytes, 'IMG_0042.JPG', { subject: 'defect', caption: 'Orange peel, left stile' }).expect(201);
    expect(res.body.photo).toMatchObject({ coatId, shownWithCoatId: coatId, subject: 'defect', caption: 'Orange peel, left stile', mimeType: 'image/jpeg', takenByName: 'Mina Castell' });
    const image = await lead.agent.get(res.body.photo.url).buffer(true).parse((r, done) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => done(null, Buffer.concat(chunks)));
    });
    expect(image.status).toBe(200);
    expect(image.headers['content-type']).toBe('image/jpeg');
    expect(Buffer.compare(image.body as Buffer, jpegBytes)).toBe(0);
  });

  it('takes only images, by their first bytes, whatever the name says', async () => {
    const pdf = await upload(lead, coatId, Buffer.from('%PDF-1.4 not a photo'), 'photo.jpg').expect(400);
    expect(pdf.body.error.fields).toHaveProperty('file');
    await upload(lead, coatId, pngBytes, 'scan.pdf').expect(201);
    const none = await lead.agent.post(`/api/coats/${coatId}/photos`).set('x-csrf-token', lead.csrf).field('subject', 'defect').expect(400);
    expect(none.body.error.fields).toHaveProperty('file');
    const bad = await upload(lead, coatId, pngBytes, 'a.png', { subject: 'selfie' }).expect(400);
    expect(bad.body.error.fields).toHaveProperty('subject');
  });

  it('refuses a photo larger than 10 MB with 413', async () => {
    const big = Buffer.concat([jpegBytes, Buffer.alloc(10 * 1024 * 1024)]);
    await upload(lead, coatId, big, 'big.jpg').expect(413);
  });

  it('keeps a sprayer to the coats of their own sessions, and an assembler out', async () => {
    const res = await upload(mina, otherSessionCoatId, pngBytes, 'x.png').expect(403);
    expect(res.body.error.message).toMatch(/not assigned to you/);
    await upload(assembler, coatId, pngBytes, 'x.png').expect(403);
    await upload(lead, 999999, pngBytes, 'x.png').expect(404);
  });

  it('shows a photo with the correction that replaces its coat, and the coat itself never changes', async () => {
    const correction = await lead.agent.post(`/api/coats/${coatId}/corrections`).set('x-csrf-token', lead.csrf).send({ reason: 'Wrong notes', notes: 'Re-sprayed after the defect' }).expect(201);
    const newId = correction.body.coat.id;
    await upload(lead, newId, pngBytes, 'after.png', { subject: 'sample-board' }).expect(201);
    const res = await admin.agent.get(`/api/coat-photos?coatIds=${newId}`).expect(200);
    expect(res.body.items.map((p: { coatId: number; shownWithCoatId: number }) => [p.coatId, p.shownWithCoatId])).toEqual([
      [coatId, newId],
      [coatId, newId],
      [newId, newId],
    ]);
    await expect(ctx.dataSource.query('DELETE FROM coat_photos')).rejects.toThrow(/append_only/);
    await lead.agent.get('/api/coat-photos?coatIds=1,,2').expect(400);
    await assembler.agent.get(`/api/coat-photos?coatIds=${newId}`).expect(403);
  });
});
