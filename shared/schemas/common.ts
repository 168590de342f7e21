import { z } from 'zod';

/** Ids are 32-bit integer columns; a larger number names nothing and PostgreSQL would refuse it. */
export const maxId = 2_147_483_647;
export const idSchema = z.coerce.number().int().positive().max(maxId);
export const idParamsSchema = z.object({ id: idSchema });

/** ISO 8601 instant with an offset, as DESIGN.md §7 asks. */
export const isoInstantSchema = z.iso.datetime({ offset: true });

export const pageQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
});
export type PageQuery = z.infer<typeof pageQuerySchema>;

export function listSchema<T extends z.ZodType>(item: T) {
  return z.object({
    items: z.array(item),
    total: z.number().int(),
    page: z.number().int(),
    pageSize: z.number().int(),
  });
}

export type List<T> = { items: T[]; total: number; page: number; pageSize: number };

export const unitSystems = ['metric', 'us'] as const;
export const unitSystemSchema = z.enum(unitSystems);
export type UnitSystem = z.infer<typeof unitSystemSchema>;
