import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, signIn, startTestApp, type SignedIn, type TestContext } from '../../helpers/test-app';
import { addCoat, addSession, buildReportFixture, type ReportFixture } from './report-fixture';

// Every expected value below is worked by hand from the rows in report-fixture.ts (sums of the
// fixture's areas, hours and litres); no figure comes from running the code under test.
let ctx: TestContext;
let lead: SignedIn;
let fx: ReportFixture;

beforeAll(async () => {
  ctx = await startTestApp();
  const admin = await signIn(ctx.app, demo.admin);
  const systems = (await admin.agent.get('/api/finish-systems').expect(200)).body.items as { id: number }[];
  fx = await buildReportFixture(ctx.dataSource, admin, systems[0].id);
  lead = await signIn(ctx.app, demo.lead);
});
afterAll(async () => ctx?.close());

const get = async (path: string) => (await lead.agent.get(path).expect(200)).body.report;

describe('booth use', () => {
  it('sums booked and sprayed hours per booth per shop week, DST week included', async () => {
    const report = await get('/api/reports/booth-use?from=2025-03-24&to=2025-04-06');
    const row = (week: string, booth: number) => report.rows.find((r: { weekStart: string; boothId: number }) => r.weekStart === week && r.boothId === booth);
    // S1 08:00–12:00 (4 h) + S2 13:00–15:30 (2.5 h); the cancelled session does not count.
    // Sprayed: S1 checklist 08:30 → clearing 11:30 (3 h); S2 first coat 13:20 → last 14:50 (1.5 h).
    expect(row('2025-03-24', fx.booth1)).toMatchObject({ sessions: 2, bookedHours: 6.5, sprayedHours: 4.5 });
    expect(row('2025-03-24', fx.booth2)).toMatchObject({ sessions: 0, bookedHours: 0, sprayedHours: 0 });
    // 23:30 UTC on Sunday 30 March is 00:30 BST on Monday 31 March: the next shop week.
    expect(row('2025-03-31', fx.booth2)).toMatchObject({ sessions: 1, bookedHours: 1, sprayedHours: 0 });
    expect(report.rows).toHaveLength(2 * 2);
  });

  it('filters to one booth', async () => {
    const report = await get(`/api/reports/booth-use?from=2025-03-24&to=2025-03-30&boothId=${fx.booth2}`);
    expect(report.rows).toEqual([expect.objectContaining({ boothId: fx.booth2, sessions: 0 })]);
  });
});

describe('area sprayed', () => {
  it('sums the current coats’ part areas by product kind', async () => {
    const report = await get('/api/reports/area-sprayed?from=2025-03-24&to=2025-03-30&groupBy=product-kind');
    // Primer: corrected coat on a+b (2 + 1.5) and c (0.5); the replaced version is not counted.
    // Topcoat: a (2), d (1) and the re-spray of a (2).
    expect(report.rows).toEqual([
      { weekStart: '2025-03-24', key: 'primer', label: 'primer', coats: 2, areaM2: 4 },
      { weekStart: '2025-03-24', key: 'topcoat', label: 'topcoat', coats: 3, areaM2: 5 },
    ]);
  });

  it('sums by job', async () => {
    const report = await get('/api/reports/area-sprayed?from=2025-03-24&to=2025-03-30&groupBy=job');
    expect(report.rows).toEqual([
      { weekStart: '2025-03-24', key: String(fx.jobJ), label: 'FX-J Fixture Customer', coats: 4, areaM2: 8 },
      { weekStart: '2025-03-24', key: String(fx.jobK), label: 'FX-K Fixture Customer', coats: 1, areaM2: 1 },
    ]);
  });
});

describe('conditions', () => {
  it('averages readings and coats per hour and marks the coat outside its limits', async () => {
    const report = await get(`/api/reports/conditions?from=2025-03-24&to=2025-03-24&boothId=${fx.booth1}`);
    expect(report.bucket).toBe('hour');
    expect(report.points).toEqual([
      // Two readings: air (18 + 20) / 2, RH (60 + 50) / 2, worst margin 18 − 10.1 (no surface reading, so air).
      { at: '2025-03-24T08:00:00.000Z', readings: 2, airTempC: 19, relativeHumidityPct: 55, dewPointMarginC: 7.9 },
      { at: '2025-03-24T09:00:00.000Z', readings: 1, airTempC: 20, relativeHumidityPct: 50, dewPointMarginC: 9.7 },
      { at: '2025-03-24T10:00:00.000Z', readings: 1, airTempC: 12, relativeHumidityPct: 85, dewPointMarginC: 2.4 },
    ]);
    expect(report.limits).toEqual([{ productId: fx.primer, productName: 'Fixture primer', minApplicationTempC: 15, maxRelativeHumidityPct: 80 }]);
    expect(report.coatCount).toBe(2);
    // 12 °C < 15 °C minimum (air and surface), 85 % > 80 %, 12 − 9.6 = 2.4 °C < 3 °C margin.
    expect(report.coatsOutside).toEqual([
      expect.objectContaining({ coatId: fx.coats.c2, dewPointMarginC: 2.4, reasons: ['air-too-cold', 'surface-too-cold', 'rh-too-high', 'dew-point-margin'] }),
    ]);
  });

  it('uses shop days for longer ranges and answers 404 for an unknown booth', async () => {
    const report = await get(`/api/reports/conditions?from=2025-03-01&to=2025-03-31&boothId=${fx.booth1}`);
    expect(report.bucket).toBe('day');
    expect(report.points.map((p: { at: string }) => p.at)).toEqual(['2025-03-24', '2025-03-26']);
    await lead.agent.get('/api/reports/conditions?from=2025-03-01&to=2025-03-31&boothId=9999').expect(404);
  });

  it('lists a coat as outside only below the 3 °C dew-point margin, not one just above it', async () => {
    // The design limit is a surface at least 3 °C above the dew point (ISO 8502-4 practice; coating
    // application guides, secondary sources). Surface 12.7 and 12.5 °C over a 9.6 °C dew point: 3.1 and 2.9 °C.
    // The fixture topcoat's data sheet gives no temperature or humidity limits, so only the margin can bite.
    const session = await addSession(ctx.dataSource, fx.booth2, '2025-05-12T08:00:00Z', '2025-05-12T12:00:00Z');
    const within = { session, product: fx.topcoat, parts: [], step: null, air: 20, rh: 50, dew: 9.6 };
    await addCoat(ctx.dataSource, { ...within, at: '2025-05-12T09:00:00Z', surface: 12.7 });
    const below = await addCoat(ctx.dataSource, { ...within, at: '2025-05-12T10:00:00Z', surface: 12.5 });
    const report = await get(`/api/reports/conditions?from=2025-05-12&to=2025-05-12&boothId=${fx.booth2}`);
    expect(report.coatCount).toBe(2);
    expect(report.coatsOutside).toEqual([expect.objectContaining({ coatId: below, dewPointMarginC: 2.9, reasons: ['dew-point-margin'] })]);
    expect(report.points.map((p: { dewPointMarginC: number }) => p.dewPointMarginC)).toEqual([3.1, 2.9]);
  });
});

describe('solvent and VOC', () => {
  it('multiplies litres mixed by VOC as applied per month with a year-to-date total', async () => {
    const report = await get('/api/reports/solvent?from=2025-03-01&to=2025-04-30');
    // March: 3 L of primer at 420 g/L = 1.26 kg, 1 L of topcoat without a VOC figure.
    // Running total starts with January's 1 L of primer (0.42 kg).
    expect(report.rows).toEqual([
      { month: '2025-03', litres: 4, vocKg: 1.26, runningTotalKg: 1.68, litresWithoutVoc: 1 },
      { month: '2025-04', litres: 2, vocKg: 0.84, runningTotalKg: 2.52, litresWithoutVoc: 0 },
    ]);
    expect(report.totalKg).toBe(2.1);
    // The threshold is the admin's setting, 150 kg in the demo shop.
    expect(report.thresholdKg).toBe(150);
  });
});

describe('material against estimate', () => {
  it('shares each session’s pots among jobs by coated area', async () => {
    const report = await get('/api/reports/material?from=2025-03-24&to=2025-03-30');
    const cell = (job: number, product: number) => report.rows.find((r: { jobId: number; productId: number }) => r.jobId === job && r.productId === product);
    // S1 primer pots 1 + 3 L, all on job J. S2 topcoat pot 1 L over J's 4 m² and K's 1 m².
    expect(cell(fx.jobJ, fx.primer)).toMatchObject({ usedL: 4, estimatedL: 0 });
    expect(cell(fx.jobJ, fx.topcoat)).toMatchObject({ usedL: 0.8 });
    expect(cell(fx.jobK, fx.topcoat)).toMatchObject({ usedL: 0.2, estimatedL: 0 });
    // Job J's estimate per product is the job estimate's ready-to-spray litres for its finish system.
    const estimate = (await lead.agent.get(`/api/jobs/${fx.jobJ}/estimate`).expect(200)).body;
    const steps = (estimate.estimate ?? estimate).steps as { productId: number; readyToSprayL: number }[];
    for (const step of steps) expect(cell(fx.jobJ, step.productId)?.estimatedL).toBeCloseTo(steps.filter((s) => s.productId === step.productId).reduce((t, s) => t + s.readyToSprayL, 0), 1);
    expect(report.byProduct.find((p: { productId: number }) => p.productId === fx.topcoat)).toMatchObject({ usedL: 1 });
  });
});

describe('rework', () => {
  it('counts corrections by reason and re-sprays of a step by reason per month', async () => {
    const report = await get('/api/reports/rework?from=2025-03-01&to=2025-03-31');
    expect(report.coatCount).toBe(5);
    expect(report.rows).toEqual([
      { month: '2025-03', kind: 'corrected', reason: 'wrong lot', count: 1 },
      { month: '2025-03', kind: 'repeated', reason: 'dust-or-debris', count: 1 },
    ]);
  });
});

describe('CSV, ranges and roles', () => {
  it('exports the table as CSV with headers people read', async () => {
    const res = await lead.agent.get('/api/reports/solvent?from=2025-03-01&to=2025-04-30&format=csv').expect(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/boothwright-solvent-2025-03-01-to-2025-04-30\.csv/);
    expect(res.text.split('\r\n')).toEqual(['Month,Litres mixed,VOC (kg),VOC this year (kg),Yearly threshold (kg),Litres without a VOC figure', '2025-03,4,1.26,1.68,150,1', '2025-04,2,0.84,2.52,150,0', '']);
  });

  it('names a coat outside limits by its time and product, with its reasons in words, never its id', async () => {
    const res = await lead.agent.get(`/api/reports/conditions?from=2025-03-24&to=2025-03-24&boothId=${fx.booth1}&format=csv`).expect(200);
    const lines = res.text.split('\r\n');
    expect(lines[0]).toBe('Time,Row,Readings,Air (°C),Relative humidity (%),Surface above dew point (°C),Product,Outside limits because');
    expect(lines).toContain('2025-03-24T10:00:00.000Z,coat outside limits,,12,85,2.4,Fixture primer,air too cold; surface too cold; humidity too high; surface too close to the dew point');
  });

  it('refuses a backwards or too long range with field messages', async () => {
    const back = await lead.agent.get('/api/reports/booth-use?from=2025-03-10&to=2025-03-01').expect(400);
    expect(back.body.error.fields.to).toMatch(/before the start/);
    const long = await lead.agent.get('/api/reports/rework?from=2020-01-01&to=2025-03-01').expect(400);
    expect(long.body.error.fields.to).toMatch(/at most/);
    const bad = await lead.agent.get('/api/reports/solvent?from=March&to=2025-03-01').expect(400);
    expect(bad.body.error.fields.from).toBeTruthy();
  });

  it('lets the owner and lead read reports, not the sprayer, assembler or a stranger', async () => {
    const path = '/api/reports/booth-use?from=2025-03-24&to=2025-03-30';
    await (await signIn(ctx.app, demo.admin)).agent.get(path).expect(200);
    await (await signIn(ctx.app, demo.sprayer)).agent.get(path).expect(403);
    await (await signIn(ctx.app, demo.assembler)).agent.get(path).expect(403);
    const { default: request } = await import('supertest');
    await request(ctx.app).get(path).expect(401);
  });
});
