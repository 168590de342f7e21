import { z } from 'zod';
import { auditListSchema } from '../../shared/schemas/audit';
import { pageFields } from '../../shared/schemas/common';
import { siteFilterFields } from '../../shared/schemas/site';
import { defineRoute, type ApiRoute } from '../registry/route';

export const auditRoutes: ApiRoute[] = [
  defineRoute({
    method: 'get',
    path: '/api/audit',
    summary: 'The audit trail, newest first: the group’s entries and those of the sites the reader sees',
    access: 'audit:read',
    sites: 'site',
    query: z.object({ ...pageFields(50, 200), ...siteFilterFields }),
    response: { status: 200, schema: auditListSchema },
    handler: ({ query }, { services }) => services.audit.list(query),
  }),
];
