import { z } from 'zod';

/** Ids are 32-bit integer columns; a larger number names nothing and PostgreSQL would refuse it. */
export const maxId = 2_147_483_647;

/**
 * An id as it comes in a path or a query string: plain decimal digits only, so "0x10", "1e3",
 * " 7", "016" and "7.0" are refused instead of being read as some other row's id.
 */
export const idSchema = z
  .string({ error: 'Give the id as a whole number' })
  .regex(/^[1-9][0-9]{0,9}$/, 'An id is a whole number from 1, written in plain digits')
  .transform(Number)
  .pipe(z.number().max(maxId, 'No record has an id that large'));
export const idParamsSchema = z.object({ id: idSchema });

/** A whole number in a query string (page, page size), in plain decimal digits. */
export function queryIntSchema(min: number, max: number) {
  return z
    .string({ error: 'Give a whole number' })
    .regex(/^[0-9]{1,10}$/, 'Give a whole number in plain digits')
    .transform(Number)
    .pipe(z.number().min(min, `At least ${min}`).max(max, `At most ${max}`));
}

/** A decimal number in a query string ("72.5"), never hexadecimal or exponent forms. */
export function queryNumberSchema(min: number, max: number) {
  return z
    .string({ error: 'Give a number' })
    .regex(/^[0-9]{1,6}(\.[0-9]{1,6})?$/, 'Give a number such as 65 or 72.5')
    .transform(Number)
    .pipe(z.number().min(min, `At least ${min}`).max(max, `At most ${max}`));
}

/** `true` or `false` in a query string. */
export const queryFlagSchema = z.enum(['true', 'false'], { error: 'Use true or false' }).transform((v) => v === 'true');

/**
 * ISO 8601 instant with an offset, as DESIGN.md §7 asks, in years a shop's records can hold: a
 * year like 0000 or 9999 is a typing slip, and five-digit years would sort wrongly as text.
 * (Instants people type for what happened are held closer to now by the services.)
 */
/**
 * A key the client makes for one write it may have to send again (a tablet offline, an answer lost on
 * the way back): the server answers a repeat with the first answer and records nothing new.
 */
export const idempotencyKeySchema = z.string().min(8, 'An idempotency key has at least 8 characters').max(80);

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
export const optionalTextSchema = (max: number, tooLong?: string) => z.string().overwrite(cleanText).max(max, tooLong);

/** Text that must say something: made of invisible characters only, it counts as empty. */
export const requiredTextSchema = (message: string, max: number, min = 1) =>
  z
    .string({ error: message })
    .overwrite(cleanText)
    .min(min, message)
    .max(max)
    .refine((value) => visibleCharacter.test(value), message);

/** `?page=&pageSize=` with the list's own largest page. */
export function pageFields(defaultSize: number, maxSize: number) {
  return { page: queryIntSchema(1, 1_000_000).default(1), pageSize: queryIntSchema(1, maxSize).default(defaultSize) };
}

export const pageQuerySchema = z.object(pageFields(50, 200));
export type PageQuery = z.infer<typeof pageQuerySchema>;

/** The §7 list shape: one page of items and the total. */
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
