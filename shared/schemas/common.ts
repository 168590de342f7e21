import { z } from 'zod';

/** Ids are 32-bit integer columns; a larger number names nothing and PostgreSQL would refuse it. */
export const maxId = 2_147_483_647;
export const idSchema = z.coerce.number().int().positive().max(maxId);
export const idParamsSchema = z.object({ id: idSchema });

/**
 * ISO 8601 instant with an offset, as DESIGN.md §7 asks, in years a shop's records can hold: a
 * year like 0000 or 9999 is a typing slip, and five-digit years would sort wrongly as text.
 * (Instants people type for what happened are held closer to now by the services.)
 */
export const isoInstantSchema = z.iso.datetime({ offset: true }).refine((value) => {
  const year = new Date(value).getUTCFullYear();
  return year >= 2000 && year <= 2199;
}, 'Enter a date between the years 2000 and 2199');

/** What shows nothing: controls, format characters (zero-width spaces, joiners, direction marks), separators and blank fillers. */
const blank = '\\p{Cc}\\p{Cf}\\p{Z}\\s\\u115F\\u1160\\u3164\\uFFA0\\u2800';
const blankEnds = new RegExp(`^[${blank}]+|[${blank}]+$`, 'gu');
const visibleCharacter = new RegExp(`[^${blank}\\p{M}]`, 'u');

/** Composed (NFC) and without anything invisible at either end. */
export const cleanText = (value: string): string => value.normalize('NFC').replace(blankEnds, '');

/** Text people type that may be left empty. */
export const optionalTextSchema = (max: number) => z.string().overwrite(cleanText).max(max);

/** Text that must say something: made of invisible characters only, it counts as empty. */
export const requiredTextSchema = (message: string, max: number, min = 1) =>
  z
    .string({ error: message })
    .overwrite(cleanText)
    .min(min, message)
    .max(max)
    .refine((value) => visibleCharacter.test(value), message);

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
