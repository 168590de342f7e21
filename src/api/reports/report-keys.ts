import type {
  AreaSprayedQuery,
  BoothUseQuery,
  ConditionsQuery,
  MaterialQuery,
  ReportRangeQuery,
} from '../../../shared/schemas/report';

export const reportKinds = ['booth-use', 'area-sprayed', 'conditions', 'solvent', 'material', 'rework', 'upkeep'] as const;
export type ReportKind = (typeof reportKinds)[number];

/** What each report is asked for; `format` is left out: the JSON calls never send it, the CSV link adds it. */
export interface ReportParams {
  'booth-use': Omit<BoothUseQuery, 'format'>;
  'area-sprayed': Omit<AreaSprayedQuery, 'format'>;
  conditions: Omit<ConditionsQuery, 'format'>;
  solvent: Omit<ReportRangeQuery, 'format'>;
  material: Omit<MaterialQuery, 'format'>;
  rework: Omit<ReportRangeQuery, 'format'>;
  upkeep: Omit<ReportRangeQuery, 'format'>;
}

export const reportKeys = {
  all: ['reports'] as const,
  details: () => [...reportKeys.all, 'detail'] as const,
  detail: <K extends ReportKind>(kind: K, params: ReportParams[K]) => [...reportKeys.details(), kind, params] as const,
};
