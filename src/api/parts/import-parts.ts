import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { importResultSchema } from '../../../shared/schemas/part';
import { apiClient } from '../../lib/api-client';
import { changedKeys } from '../changes';
import { invalidate } from '../invalidate';

/**
 * The shared result schema types preview rows as valid parts, but rows with errors come back as
 * the server read them (a length that is not a number arrives as null), so preview rows are loose here.
 */
const previewResultSchema = importResultSchema.extend({ preview: z.array(z.record(z.string(), z.unknown())) });
export type ImportPreview = z.infer<typeof previewResultSchema>;
export type ColumnMapping = Record<string, string>;

interface ImportCall {
  jobId: number;
  file: File;
  mapping: ColumnMapping;
}

function importForm(file: File, mapping: ColumnMapping, preview: boolean): FormData {
  const form = new FormData();
  form.set('file', file);
  form.set('mapping', JSON.stringify(mapping));
  if (preview) form.set('preview', 'true');
  return form;
}

/** Reads the file and checks every row; saves nothing. */
export function previewPartsImport({ jobId, file, mapping }: ImportCall) {
  return apiClient.postForm(`/api/jobs/${jobId}/parts/import`, importForm(file, mapping, true), previewResultSchema);
}

/** Saves every row, or none when any row is wrong (a 400 naming the rows). */
export async function commitPartsImport({ jobId, file, mapping }: ImportCall) {
  const result = await apiClient.postForm(
    `/api/jobs/${jobId}/parts/import`,
    importForm(file, mapping, false),
    previewResultSchema,
  );
  return result.items;
}

export function usePreviewPartsImport() {
  return useMutation({ mutationFn: previewPartsImport });
}

export function useCommitPartsImport() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: commitPartsImport, onSuccess: () => invalidate(queryClient, changedKeys.part()) });
}

/** A cut-list CSV with the expected columns, as a plain download link. */
export const partsTemplateHref = '/api/jobs/parts-template.csv';
