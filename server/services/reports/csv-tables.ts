import type { AreaSprayedReport, BoothUseReport, ConditionsReport, MaterialReport, ReworkReport, SolventReport, UpkeepReport } from '../../../shared/schemas/report';
import { toCsv } from './csv';

/** Each report's table as CSV, SI units, the same rows the page shows. */
export const reportCsv = {
  boothUse: (r: BoothUseReport) =>
    toCsv(['week_start', 'booth', 'sessions', 'booked_hours', 'sprayed_hours'], r.rows.map((x) => [x.weekStart, x.boothName, x.sessions, x.bookedHours, x.sprayedHours])),
  areaSprayed: (r: AreaSprayedReport) => toCsv(['week_start', r.groupBy, 'coats', 'area_m2'], r.rows.map((x) => [x.weekStart, x.label, x.coats, x.areaM2])),
  conditions: (r: ConditionsReport) =>
    toCsv(
      ['at', 'kind', 'readings_or_coat', 'air_c', 'rh_pct', 'dew_point_margin_c', 'product', 'outside_because'],
      [
        ...r.points.map((p) => [p.at, 'conditions', p.readings, p.airTempC, p.relativeHumidityPct, p.dewPointMarginC, '', '']),
        ...r.coatsOutside.map((c) => [c.sprayedAt, 'coat outside limits', c.coatId, c.airTempC, c.relativeHumidityPct, c.dewPointMarginC, c.productName, c.reasons.join(' ')]),
      ],
    ),
  solvent: (r: SolventReport) =>
    toCsv(['month', 'litres', 'voc_kg', 'running_total_kg', 'threshold_kg', 'litres_without_voc'], r.rows.map((x) => [x.month, x.litres, x.vocKg, x.runningTotalKg, r.thresholdKg, x.litresWithoutVoc])),
  material: (r: MaterialReport) =>
    toCsv(['job', 'customer', 'product', 'estimated_l', 'used_l'], r.rows.map((x) => [x.jobReference, x.customer, x.productName, x.estimatedL, x.usedL])),
  rework: (r: ReworkReport) => toCsv(['month', 'kind', 'reason', 'count'], r.rows.map((x) => [x.month, x.kind, x.reason, x.count])),
  upkeep: (r: UpkeepReport) => toCsv(['booth', 'kind', 'done', 'due', 'done_by_due_date'], r.rows.map((x) => [x.boothName ?? 'crew', x.kind, x.done, x.due ?? '', x.doneByDue ?? ''])),
};
