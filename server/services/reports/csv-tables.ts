import type { AreaSprayedReport, BoothUseReport, ConditionsReport, MaterialReport, ReworkReport, SolventReport, UpkeepReport } from '../../../shared/schemas/report';
import { csvHeaders, outsideReasonWords } from '../../../shared/words';
import { toCsv } from './csv';

/** Each report's table as CSV, SI units, the same rows the page shows, with the headers people read (shared/words.ts). */
export const reportCsv = {
  boothUse: (r: BoothUseReport) =>
    toCsv([...csvHeaders.boothUse], r.rows.map((x) => [x.weekStart, x.boothName, x.sessions, x.bookedHours, x.sprayedHours])),
  areaSprayed: (r: AreaSprayedReport) => toCsv(csvHeaders.areaSprayed(r.groupBy), r.rows.map((x) => [x.weekStart, x.label, x.coats, x.areaM2])),
  conditions: (r: ConditionsReport) =>
    toCsv(
      [...csvHeaders.conditions],
      [
        ...r.points.map((p) => [p.at, 'readings', p.readings, p.airTempC, p.relativeHumidityPct, p.dewPointMarginC, '', '']),
        ...r.coatsOutside.map((c) => [c.sprayedAt, 'coat outside limits', '', c.airTempC, c.relativeHumidityPct, c.dewPointMarginC, c.productName, c.reasons.map((reason) => outsideReasonWords[reason]).join('; ')]),
      ],
    ),
  solvent: (r: SolventReport) =>
    toCsv([...csvHeaders.solvent], r.rows.map((x) => [x.month, x.litres, x.vocKg, x.runningTotalKg, r.thresholdKg, x.litresWithoutVoc])),
  material: (r: MaterialReport) =>
    toCsv([...csvHeaders.material], r.rows.map((x) => [x.jobReference, x.customer, x.productName, x.estimatedL, x.usedL])),
  rework: (r: ReworkReport) => toCsv([...csvHeaders.rework], r.rows.map((x) => [x.month, x.kind, x.reason, x.count])),
  upkeep: (r: UpkeepReport) => toCsv([...csvHeaders.upkeep], r.rows.map((x) => [x.boothName ?? 'crew', x.kind, x.done, x.due ?? '', x.doneByDue ?? ''])),
};
