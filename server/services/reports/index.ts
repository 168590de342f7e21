import type { AreaSprayedQuery, BoothUseQuery, ConditionsQuery, MaterialQuery, ReportRangeQuery } from '../../../shared/schemas/report';
import type { SiteData } from '../../data/site-data';
import type { EstimateService } from '../estimates';
import type { SettingsService } from '../settings';
import { areaSprayedReport } from './area-sprayed';
import { boothUseReport } from './booth-use';
import { conditionsReport } from './conditions';
import { materialReport } from './material';
import { reworkReport } from './rework';
import { solventReport } from './solvent';
import { upkeepReport } from './upkeep';

/**
 * Read-only aggregates over the coat log; every report is grouped in the database by shop-time
 * buckets. The site is the scope's, whatever the query asks: a lead's reports are their site's,
 * an admin's the site named by `?siteId=`, or the whole group.
 */
export function createReportService(data: SiteData, settings: SettingsService, estimates: EstimateService) {
  const timeZone = async () => (await settings.get()).timezone;
  const site = <Q extends { siteId?: number }>(query: Q): Q => ({ ...query, siteId: data.scope.siteId ?? undefined });
  return {
    boothUse: async (query: BoothUseQuery) => boothUseReport(data, site(query), await timeZone()),
    areaSprayed: async (query: AreaSprayedQuery) => areaSprayedReport(data, site(query), await timeZone()),
    conditions: async (query: ConditionsQuery) => conditionsReport(data, site(query), await timeZone()),
    solvent: async (query: ReportRangeQuery) => {
      const shop = await settings.get();
      return solventReport(data, site(query), shop.timezone, shop.yearlySolventThresholdKg);
    },
    material: async (query: MaterialQuery) => materialReport(data, estimates, site(query), await timeZone()),
    rework: async (query: ReportRangeQuery) => reworkReport(data, site(query), await timeZone()),
    upkeep: async (query: ReportRangeQuery) => upkeepReport(data, site(query), await timeZone()),
  };
}

export type ReportService = ReturnType<typeof createReportService>;
