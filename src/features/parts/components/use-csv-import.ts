import { useRef, useState } from 'react';
import { errorMessage } from '../../../lib/error-messages';
import { usePreviewPartsImport, type ImportPreview } from '../../../api/parts/import-parts';
import { emptyMapping, guessMapping, type FieldMapping } from './import-mapping';

interface ImportState {
  file: File | null;
  mapping: FieldMapping;
  preview: ImportPreview | null;
  problem: string | null;
}

/**
 * The import's working state: the chosen file, the column mapping, and the latest preview of
 * both. Every change asks the server again; only the newest answer is kept.
 */
export function useCsvImport(jobId: number) {
  const previewCall = usePreviewPartsImport();
  const [state, setState] = useState<ImportState>({ file: null, mapping: emptyMapping(), preview: null, problem: null });
  const latest = useRef(0);

  async function check(file: File, mapping: FieldMapping, reguess: boolean) {
    const call = ++latest.current;
    setState((s) => ({ ...s, file, mapping, problem: null }));
    try {
      let preview = await previewCall.mutateAsync({ jobId, file, mapping });
      let nextMapping = mapping;
      // A new file's headers are only known from its first preview; check again once they are mapped.
      if (reguess) nextMapping = guessMapping(preview.headers, mapping);
      if (JSON.stringify(nextMapping) !== JSON.stringify(mapping)) {
        preview = await previewCall.mutateAsync({ jobId, file, mapping: nextMapping });
      }
      if (call === latest.current) setState({ file, mapping: nextMapping, preview, problem: null });
    } catch (error) {
      if (call === latest.current) setState({ file, mapping, preview: null, problem: errorMessage(error) });
    }
  }

  async function chooseFile(file: File | null) {
    if (file) return check(file, state.mapping, true);
    latest.current++;
    setState((s) => ({ ...s, file: null, preview: null, problem: null }));
  }

  async function mapField(field: keyof FieldMapping, header: string) {
    if (state.file) await check(state.file, { ...state.mapping, [field]: header }, false);
  }

  return { ...state, checking: previewCall.isPending, chooseFile, mapField };
}
