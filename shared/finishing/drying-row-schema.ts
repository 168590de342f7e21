import { z } from 'zod';

// Upper bounds only catch typing slips (an extra zero), not real products: sixty days in
// minutes, a year in hours.
const maxMinutes = 60 * 24 * 60;

const minutes = (what: string) =>
  z
    .number({ error: `Enter the ${what} time` })
    .min(0, `The ${what} time cannot be negative`)
    .max(maxMinutes, `The ${what} time looks too long (over 60 days)`);

/** One line of a data sheet's drying table: every time measured at `tempC`. */
export const dryingRowSchema = z
  .object({
    tempC: z
      .number({ error: 'Enter the temperature these times were measured at' })
      .min(-10, 'Drying temperature must be -10 °C or above')
      .max(120, 'Drying temperature must be 120 °C or below'),
    flashOffMin: minutes('flash-off'),
    recoatMinMin: minutes('earliest recoat'),
    /** null: the data sheet gives no latest recoat time, so the window never closes. */
    recoatMaxMin: minutes('latest recoat').nullable(),
    touchDryMin: minutes('touch-dry'),
    handleMin: minutes('dry-to-handle'),
    packMin: minutes('dry-to-pack'),
    fullCureH: z
      .number({ error: 'Enter the full-cure time in hours' })
      .positive('The full-cure time must be more than 0')
      .max(24 * 365, 'The full-cure time looks too long; enter hours'),
  })
  .refine((row) => row.recoatMaxMin === null || row.recoatMaxMin >= row.recoatMinMin, {
    message: 'The latest recoat time cannot be before the earliest',
    path: ['recoatMaxMin'],
  });

export type DryingRow = z.infer<typeof dryingRowSchema>;

/**
 * A product's whole drying table. Temperatures must differ (two rows at one temperature
 * cannot be interpolated between), and a latest recoat time must be given at every
 * temperature or at none, because blending "closes" with "never closes" has no meaning.
 */
export const dryingTableSchema = z
  .array(dryingRowSchema)
  .min(1, 'Give the drying times at one temperature at least')
  .max(12, 'Give no more than 12 temperature rows')
  .superRefine((rows, ctx) => {
    const seen = new Set<number>();
    rows.forEach((row, index) => {
      if (seen.has(row.tempC)) {
        ctx.addIssue({ code: 'custom', message: 'Two rows have the same temperature', path: [index, 'tempC'] });
      }
      seen.add(row.tempC);
    });
    const withMax = rows.filter((row) => row.recoatMaxMin !== null).length;
    if (withMax > 0 && withMax < rows.length) {
      const index = rows.findIndex((row) => row.recoatMaxMin === null);
      ctx.addIssue({
        code: 'custom',
        message: 'Give a latest recoat time at every temperature, or at none',
        path: [index, 'recoatMaxMin'],
      });
    }
  });
