import type { DataSource } from 'typeorm';
import type { AreaSprayedQuery, BoothUseQuery, ConditionsQuery, MaterialQuery, ReportRangeQuery } from '../../../shared/schemas/report';
import type { EstimateService } from '../estimates';
import type { SettingsService } from '../settings';
import { areaSprayedReport } from './area-sprayed';
import { boothUseReport } from './booth-use';
import { conditionsReport } from './conditions';
import { materialReport } from './material';
import { reworkReport } from './rework';
import { solventReport } from './solvent';

/** Read-only aggregates over the coat log; every report is grouped in the database by shop-time buckets. */
export function createReportService(dataSource: DataSource, settings: SettingsService, estimates: EstimateService) {
  const timeZone = async () => (await settings.get()).timezone;
  return {
    boothUse: async (query: BoothUseQuery) => boothUseReport(dataSource, query, await timeZone()),
    areaSprayed: async (query: AreaSprayedQuery) => areaSprayedReport(dataSource, query, await timeZone()),
    conditions: async (query: ConditionsQuery) => conditionsReport(dataSource, query, await timeZone()),
    solvent: async (query: ReportRangeQuery) => {
      const shop = await settings.get();
      return solventReport(dataSource, query, shop.timezone, shop.yearlySolventThresholdKg);
    },
    material: async (query: MaterialQuery) => materialReport(dataSource, estimates, query, await timeZone()),
    rework: async (query: ReportRangeQuery) => reworkReport(dataSource, query, await timeZone()),
  };
}

export type ReportService = ReturnType<typeof createReportService>;
