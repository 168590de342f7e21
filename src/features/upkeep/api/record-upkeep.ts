import { z } from 'zod';
import {
  extractionTestSchema,
  filterBankSchema,
  filterChangeSchema,
  fireInspectionSchema,
  gaugeReadingSchema,
  type CreateExtractionTestInput,
  type CreateFilterBankInput,
  type CreateFilterChangeInput,
  type CreateFireInspectionInput,
  type CreateGaugeReadingInput,
  type UpdateFilterBankInput,
} from '../../../../shared/schemas/upkeep';
import { useUpkeepWrite } from './use-upkeep-record';

/** One hook per upkeep call; each posts to its own route and refreshes the booth's record. */
export const useCreateFilterBank = () => useUpkeepWrite((body: CreateFilterBankInput) => ({ method: 'post', path: '/api/filter-banks', body }), z.object({ filterBank: filterBankSchema }));

export const useUpdateFilterBank = () =>
  useUpkeepWrite(({ id, changes }: { id: number; changes: UpdateFilterBankInput }) => ({ method: 'patch', path: `/api/filter-banks/${id}`, body: changes }), z.object({ filterBank: filterBankSchema }));

export const useRecordGaugeReading = () => useUpkeepWrite((body: CreateGaugeReadingInput) => ({ method: 'post', path: '/api/readings/filter-gauge', body }), z.object({ reading: gaugeReadingSchema }));

export const useRecordFilterChange = () => useUpkeepWrite((body: CreateFilterChangeInput) => ({ method: 'post', path: '/api/filter-changes', body }), z.object({ filterChange: filterChangeSchema }));

export const useRecordExtractionTest = () => useUpkeepWrite((body: CreateExtractionTestInput) => ({ method: 'post', path: '/api/extraction-tests', body }), z.object({ extractionTest: extractionTestSchema }));

export const useRecordFireInspection = () => useUpkeepWrite((body: CreateFireInspectionInput) => ({ method: 'post', path: '/api/fire-inspections', body }), z.object({ fireInspection: fireInspectionSchema }));
