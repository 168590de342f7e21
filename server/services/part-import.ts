import { parse } from 'csv-parse/sync';
import { createPartSchema, csvTemplateHeaders, type CreatePartInput, type ImportResult, type ImportRowError } from '../../shared/schemas/part';
import type { SiteData } from '../data/site-data';
import { AppError, notFound } from '../lib/app-error';
import type { Actor } from './audit';
import type { PartService } from './parts';

type Field = (typeof csvTemplateHeaders)[number];
const numericFields: Field[] = ['lengthMm', 'widthMm', 'thicknessMm', 'quantity'];
const yes = new Set(['yes', 'y', 'true', '1', 'x']);
const no = new Set(['no', 'n', 'false', '0', '']);

function readCsv(buffer: Buffer): Record<string, string>[] {
  try {
    return parse(buffer, { columns: true, bom: true, trim: true, skip_empty_lines: true, relax_column_count: true, delimiter: [',', ';', '\t'] });
  } catch (error) {
    throw new AppError('validation_failed', `The file could not be read as CSV: ${(error as Error).message}`, { file: 'Not a readable CSV file' });
  }
}

/** One CSV line in our field names, with the light coercion a cut list from a spreadsheet needs. */
function toCandidate(raw: Record<string, string>, mapping: Record<string, string>): Record<string, unknown> {
  const candidate: Record<string, unknown> = {};
  for (const field of csvTemplateHeaders) {
    const value = raw[mapping[field] ?? field];
    if (value === undefined || (value === '' && field !== 'edges')) continue;
    if (numericFields.includes(field)) candidate[field] = Number(value.replace(/\s/g, ''));
    else if (field === 'edges') candidate[field] = yes.has(value.toLowerCase()) ? true : no.has(value.toLowerCase()) ? false : value;
    else if (field === 'faces') candidate[field] = { '1': 'one', '2': 'both' }[value] ?? value.toLowerCase();
    else candidate[field] = value;
  }
  return candidate;
}

export function createPartImportService(data: SiteData, parts: PartService) {
  return {
    /** Every row is checked; nothing is saved unless all are good and this is not a preview (a bad row is a 400 naming each row and field). */
    async importCsv(jobId: number, buffer: Buffer | undefined, mapping: Record<string, string>, preview: boolean, actor: Actor): Promise<ImportResult> {
      if (!buffer) throw new AppError('validation_failed', 'Choose a CSV file', { file: 'Choose a CSV file' });
      if (!(await data.jobs.existsBy({ id: jobId }))) throw notFound('Job');
      const rows = readCsv(buffer);
      const headers = rows.length ? Object.keys(rows[0]) : [];
      const errors: ImportRowError[] = [];
      const parsed = rows.map((raw, index) => {
        const result = createPartSchema.safeParse(toCandidate(raw, mapping));
        // Row numbers as a spreadsheet shows them: the header is row 1.
        if (!result.success) for (const issue of result.error.issues) errors.push({ row: index + 2, field: String(issue.path[0] ?? ''), message: issue.message });
        return result.success ? { row: index + 2, ...result.data } : { row: index + 2, ...toCandidate(raw, mapping) };
      });
      if (rows.length === 0) errors.push({ row: 1, field: 'file', message: 'The file has no rows under its header' });
      const base = { rowCount: rows.length, preview: parsed.slice(0, 200) as ImportResult['preview'], errors, headers };
      if (preview) return { ...base, saved: false, items: [] };
      if (errors.length) {
        const fields = Object.fromEntries(errors.map((e) => [`rows.${e.row}.${e.field}`, e.message]));
        throw new AppError('validation_failed', `${new Set(errors.map((e) => e.row)).size} rows need fixing; nothing was saved`, fields);
      }
      const inputs = parsed.map(({ row: _row, ...fields }) => fields as CreatePartInput);
      return { ...base, saved: true, items: await parts.createMany(jobId, inputs, actor, 'Imported') };
    },
  };
}

export type PartImportService = ReturnType<typeof createPartImportService>;
