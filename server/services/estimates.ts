import { In } from 'typeorm';
import { estimateMaterial, type MaterialEstimate } from '../../shared/finishing/estimate';
import { sprayMethods } from '../../shared/finishing/material';
import type { EstimateQuery } from '../../shared/schemas/job';
import type { SiteData } from '../data/site-data';
import { AppError, notFound } from '../lib/app-error';
import type { SettingsService } from './settings';

/** Material for a whole job: jobs and their parts are the group's, wherever they are sprayed. */
export function createEstimateService(data: SiteData, settings: SettingsService) {
  return {
    /** Litres, mix, VOC and cost (in the shop's currency) of every coat step of the job's finish system over all its parts. */
    async forJob(jobId: number, query: EstimateQuery): Promise<MaterialEstimate & { method: string; currency: string }> {
      const job = await data.jobs.findOneBy({ id: jobId });
      if (!job) throw notFound('Job');
      if (!job.finishSystemId) throw new AppError('conflict', `Job ${job.reference} has no finish system yet; choose one to estimate material`);
      const { area } = (await data.parts
        .select('p')
        .select('COALESCE(SUM(p.coated_area_m2), 0)', 'area')
        .where('p.job_id = :jobId', { jobId })
        .getRawOne<{ area: string | number }>()) ?? { area: 0 };
      const steps = await data.finishSteps.find({ where: { finishSystemId: job.finishSystemId, kind: 'coat' }, order: { position: 'ASC' } });
      const products = await data.products.findBy({ id: In(steps.map((s) => s.productId!)) });
      const byId = new Map(products.map((p) => [p.id, p]));
      const transferEfficiencyPct = query.transferEfficiencyPct ?? sprayMethods[query.method].transferEfficiencyPct;
      const estimate = estimateMaterial({
        areaM2: Number(area),
        transferEfficiencyPct,
        steps: steps.map((s) => ({ position: s.position, dryFilmUm: s.dryFilmUm!, product: byId.get(s.productId!)! })),
      });
      return { ...estimate, method: query.method, currency: (await settings.get()).currency };
    },
  };
}

export type EstimateService = ReturnType<typeof createEstimateService>;
