import { idParamsSchema } from '../../shared/schemas/common';
import {
  boothUpkeepResponseSchema,
  createExtractionTestSchema,
  createFilterBankSchema,
  createFilterChangeSchema,
  createFireInspectionSchema,
  createGaugeReadingSchema,
  extractionTestResponseSchema,
  filterBankResponseSchema,
  filterChangeResponseSchema,
  fireInspectionResponseSchema,
  gaugeReadingResponseSchema,
  updateFilterBankSchema,
  upkeepDueQuerySchema,
  upkeepDueResponseSchema,
} from '../../shared/schemas/upkeep';
import { defineRoute, type ApiRoute } from '../registry/route';

/** Booth upkeep is the booth's site's: its filter banks, gauge readings, filter changes, extraction tests and fire inspections. */
export const upkeepRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/booths/:id/upkeep',
    summary:
      'A booth’s upkeep: filter banks with what their gauges say, the last extraction test and fire inspection with their due dates, and the recent record',
    access: 'upkeep:read',
    sites: 'site',
    params: idParamsSchema,
    response: { status: 200, schema: boothUpkeepResponseSchema },
    handler: async ({ params }, { services }) => ({ upkeep: await services.upkeep.overview(params.id) }),
  }),
  defineRoute({
    method: 'get',
    path: '/api/upkeep/due',
    summary:
      'Booths and people not fit to spray or due soon (?withinDays; an admin ?siteId); a sprayer sees only their own crew records',
    access: 'upkeep:read',
    sites: 'site',
    query: upkeepDueQuerySchema,
    response: { status: 200, schema: upkeepDueResponseSchema },
    handler: async ({ query }, { services, user }) => ({ due: await services.upkeepDue.due(user!, query.withinDays) }),
  }),
  defineRoute({
    method: 'post',
    path: '/api/filter-banks',
    summary: 'Add a bank of filters to a booth, with the pressure drop its maker says to change it at',
    access: 'upkeep:write',
    sites: 'site',
    body: createFilterBankSchema,
    response: { status: 201, schema: filterBankResponseSchema },
    handler: async ({ body }, { services, actor }) => ({ filterBank: await services.upkeep.createBank(body, actor) }),
  }),
  defineRoute({
    method: 'patch',
    path: '/api/filter-banks/:id',
    summary: 'Rename a filter bank, change its limit, or retire it',
    access: 'upkeep:write',
    sites: 'site',
    params: idParamsSchema,
    body: updateFilterBankSchema,
    response: { status: 200, schema: filterBankResponseSchema },
    handler: async ({ params, body }, { services, actor }) => ({
      filterBank: await services.upkeep.updateBank(params.id, body, actor),
    }),
  }),
  defineRoute({
    method: 'post',
    path: '/api/readings/filter-gauge',
    summary:
      'Record a filter gauge reading (signed in, or the booth’s sensor with Authorization: Bearer <token>, for its own booth’s banks)',
    access: { sensorOr: 'upkeep:log' },
    sites: 'site',
    body: createGaugeReadingSchema,
    response: { status: 201, schema: gaugeReadingResponseSchema },
    handler: async ({ body }, { services, sensor, actor }) => {
      const source = sensor ? { actor: null, sensorBoothId: sensor.boothId } : { actor };
      return { reading: await services.upkeep.recordGaugeReading(body, source) };
    },
  }),
  defineRoute({
    method: 'post',
    path: '/api/filter-changes',
    summary: 'Log a filter change: which bank, when, the gauge before and after',
    access: 'upkeep:log',
    sites: 'site',
    body: createFilterChangeSchema,
    response: { status: 201, schema: filterChangeResponseSchema },
    handler: async ({ body }, { services, actor }) => ({
      filterChange: await services.upkeep.recordFilterChange(body, actor),
    }),
  }),
  defineRoute({
    method: 'post',
    path: '/api/extraction-tests',
    summary:
      'Record an extraction test: face velocity at points across the face (the mean is worked out), clearance time measured, who tested, next due',
    access: 'upkeep:write',
    sites: 'site',
    body: createExtractionTestSchema,
    response: { status: 201, schema: extractionTestResponseSchema },
    handler: async ({ body }, { services, actor }) => ({
      extractionTest: await services.upkeep.recordExtractionTest(body, actor),
    }),
  }),
  defineRoute({
    method: 'post',
    path: '/api/fire-inspections',
    summary: 'Record a fire-protection inspection of a booth, with its result and next due date',
    access: 'upkeep:write',
    sites: 'site',
    body: createFireInspectionSchema,
    response: { status: 201, schema: fireInspectionResponseSchema },
    handler: async ({ body }, { services, actor }) => ({
      fireInspection: await services.upkeep.recordFireInspection(body, actor),
    }),
  }),
];
