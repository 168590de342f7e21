import { csvTemplateHeaders } from '../../../../shared/schemas/part';

export type PartField = (typeof csvTemplateHeaders)[number];
/**
 * Our field → the file's column. Every field is sent, an unmapped one as "" (a column no file has):
 * the server falls back to a column named like our field, and "not in the file" must mean not read.
 */
export type FieldMapping = Record<PartField, string>;

export const partFieldLabels: Record<PartField, string> = {
  label: 'Label',
  kind: 'Kind',
  lengthMm: 'Length (mm)',
  widthMm: 'Width (mm)',
  thicknessMm: 'Thickness (mm)',
  quantity: 'Quantity',
  faces: 'Faces',
  edges: 'Edges',
};

export const requiredFields: ReadonlySet<PartField> = new Set(['label', 'lengthMm', 'widthMm', 'thicknessMm']);

export const fieldHints: Record<PartField, string> = {
  label: 'Required.',
  kind: 'Optional: door, panel…',
  lengthMm: 'Required, in mm.',
  widthMm: 'Required, in mm.',
  thicknessMm: 'Required, in mm.',
  quantity: 'Optional; 1 when missing.',
  faces: 'Optional: one or both (1 or 2); both when missing.',
  edges: 'Optional: yes or no; yes when missing.',
};

const squash = (text: string) => text.toLowerCase().replace(/[^a-z0-9]/g, '');

// Besides our own names, a few that spreadsheets commonly use for the same column.
const aliases: Record<PartField, string[]> = {
  label: ['part', 'partname', 'name'],
  kind: ['type'],
  lengthMm: ['length'],
  widthMm: ['width'],
  thicknessMm: ['thickness'],
  quantity: ['qty', 'count'],
  faces: ['face'],
  edges: ['edge'],
};

function guessHeader(field: PartField, headers: string[]): string {
  const names = new Set([squash(field), squash(partFieldLabels[field]), ...aliases[field]]);
  return headers.find((header) => names.has(squash(header))) ?? '';
}

/** Keeps choices that still name a column of the file; guesses the rest by matching names (case and spacing ignored). */
export function guessMapping(headers: string[], previous?: FieldMapping): FieldMapping {
  const entries = csvTemplateHeaders.map((field) => {
    const kept = previous?.[field];
    return [field, kept && headers.includes(kept) ? kept : guessHeader(field, headers)] as const;
  });
  return Object.fromEntries(entries) as FieldMapping;
}

export const emptyMapping = (): FieldMapping => guessMapping([]);


export function fieldLabel(field: string): string {
  return field in partFieldLabels ? partFieldLabels[field as PartField] : field === 'file' ? 'File' : field;
}

const plainWords: Partial<Record<PartField, string>> = {
  lengthMm: 'Enter the length in mm, as a number',
  widthMm: 'Enter the width in mm, as a number',
  thicknessMm: 'Enter the thickness in mm, as a number',
  quantity: 'Enter a whole number of pieces',
  edges: 'Use yes or no',
  faces: 'Use one or both',
};

/** Some checks answer in the schema library's own words ("Invalid input: expected number…"); say it in ours. */
export function plainMessage(field: string, message: string): string {
  if (!message.startsWith('Invalid input')) return message;
  return plainWords[field as PartField] ?? 'This value could not be read';
}
