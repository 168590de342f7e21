import type { ShopRefs } from './base-shop';
import { isoInstant as iso } from './iso';
import { boothConditions, createCoatOffsets, type Conditions } from './conditions';
import { partIdsOf, type Row } from './job-rows';
import { coatIdsPerSession, heatedRacks, readingMinutes, readingsPerDay, sessionsOn, sessionsPerDay, type SessionSlot } from './shop-plan';
import { seededRandom, type Timeline } from './timeline';

export interface DayRows {
  sessions: Row[];
  items: Row[];
  coats: Row[];
  coatParts: Row[];
  readings: Row[];
}

const thinningPct = 10;
const coatOffsetsFor = createCoatOffsets();

function sessionRow(id: number, s: SessionSlot, nowMs: number): Row {
  const state = s.endMs <= nowMs ? 'done' : s.startMs <= nowMs ? 'spraying' : 'planned';
  const createdMs = Math.min(s.startMs - 7 * 86_400_000, nowMs);
  const sprayingStarted = state === 'planned' ? null : iso(s.startMs + 5 * 60_000);
  const clearingStarted = state === 'done' ? iso(s.endMs - 15 * 60_000) : null;
  return [id, s.boothId, iso(s.startMs), iso(s.endMs), s.sprayer.id, state, '', null, null, sprayingStarted, clearingStarted, iso(createdMs), iso(state === 'done' ? s.endMs : createdMs)];
}

interface CoatContext {
  sessionId: number;
  slot: SessionSlot;
  refs: ShopRefs;
  conditions: Conditions;
  random: () => number;
}

/** One coat record (version 1, or a correction of `replaces`) over one part. */
function coatRow(id: number, ctx: CoatContext, sprayedMs: number, replaces: { id: number; recordedMs: number } | null): Row {
  const step = ctx.refs.systems[ctx.slot.system].coats[ctx.slot.coat];
  const rack = ctx.refs.racks[ctx.slot.jobSeq % ctx.refs.racks.length];
  const dryingTempC = rack.dryingTempC ?? ctx.conditions.airTempC;
  const t = coatOffsetsFor(step, dryingTempC);
  const solids = step.volumeSolidsPct / 100 / (1 + thinningPct / 100);
  const wetFilmUm = Math.round((step.dryFilmUm / solids) * (0.9 + ctx.random() * 0.2));
  const c = ctx.conditions;
  const recordedMs = replaces ? replaces.recordedMs + 45 * 60_000 : sprayedMs + 60_000;
  return [
    id, ctx.sessionId, step.productId, step.lotId, step.position, null, iso(sprayedMs), c.airTempC, c.relativeHumidityPct, c.surfaceTempC, c.dewPointC, thinningPct, wetFilmUm, wetFilmUm * solids, dryingTempC, t.method,
    iso(sprayedMs + t.flashOffMs), iso(sprayedMs + t.recoatOpensMs), t.recoatClosesMs === null ? null : iso(sprayedMs + t.recoatClosesMs), iso(sprayedMs + t.touchDryMs), iso(sprayedMs + t.handleMs), iso(sprayedMs + t.packMs), iso(sprayedMs + t.fullCureMs),
    '[]', '', replaces ? 2 : 1, replaces?.id ?? null, replaces ? 'Dry film re-measured with the comb gauge' : null, ctx.slot.sprayer.id, ctx.slot.sprayer.name, iso(recordedMs), null,
  ];
}

function addSessionCoats(rows: DayRows, ctx: CoatContext, firstCoatId: number, nowMs: number): void {
  const parts = partIdsOf(ctx.slot.jobSeq, ctx.refs);
  const spacingMs = (ctx.slot.endMs - ctx.slot.startMs - 15 * 60_000) / parts.length;
  parts.forEach((partId, i) => {
    const sprayedMs = Math.round(ctx.slot.startMs + 8 * 60_000 + i * spacingMs);
    if (sprayedMs >= nowMs) return;
    rows.coats.push(coatRow(firstCoatId + i, ctx, sprayedMs, null));
    rows.coatParts.push([firstCoatId + i, partId]);
    // Every tenth session has one coat corrected afterwards: a new version, the old one kept.
    if (i === 3 && ctx.sessionId % 10 === 0) {
      const correctionId = firstCoatId + coatIdsPerSession - 1;
      rows.coats.push(coatRow(correctionId, ctx, sprayedMs, { id: firstCoatId + i, recordedMs: sprayedMs + 60_000 }));
      rows.coatParts.push([correctionId, partId]);
    }
  });
}

function addReadings(rows: DayRows, day: number, timeline: Timeline, refs: ShopRefs, random: () => number): void {
  const { midnightMs, yearFraction } = timeline.days[day];
  let id = refs.nextId.readings + day * readingsPerDay(refs);
  const sources = [...refs.boothIds.map((boothId) => ({ boothId, rackId: null, every: readingMinutes.boothEvery })), ...heatedRacks(refs).map((r) => ({ boothId: null, rackId: r.id, every: readingMinutes.rackEvery }))];
  for (const source of sources) {
    for (let minute = readingMinutes.opensMin; minute < readingMinutes.closesMin; minute += source.every) {
      const at = midnightMs + minute * 60_000;
      const c = boothConditions(yearFraction, random);
      if (at < timeline.now.getTime()) rows.readings.push([id, source.boothId, source.rackId, iso(at), c.airTempC, c.relativeHumidityPct, c.surfaceTempC, c.dewPointC, 'sensor', null]);
      id += 1;
    }
  }
}

/** Every row one working day adds: its sessions with their planned parts, the coats sprayed, the sensor readings. */
export function dayRows(day: number, timeline: Timeline, refs: ShopRefs): DayRows {
  const rows: DayRows = { sessions: [], items: [], coats: [], coatParts: [], readings: [] };
  const random = seededRandom(day * 15485863 + 11);
  const nowMs = timeline.now.getTime();
  for (const slot of sessionsOn(day, timeline, refs)) {
    const sessionIndex = day * sessionsPerDay(refs) + slot.slot;
    const sessionId = refs.nextId.spray_sessions + sessionIndex;
    const step = refs.systems[slot.system].coats[slot.coat];
    rows.sessions.push(sessionRow(sessionId, slot, nowMs));
    partIdsOf(slot.jobSeq, refs).forEach((partId, i) => rows.items.push([refs.nextId.spray_session_items + sessionIndex * coatIdsPerSession + i, sessionId, partId, step.position]));
    const conditions = boothConditions(timeline.days[day].yearFraction, random);
    addSessionCoats(rows, { sessionId, slot, refs, conditions, random }, refs.nextId.coats + sessionIndex * coatIdsPerSession, nowMs);
  }
  addReadings(rows, day, timeline, refs, random);
  return rows;
}
