import { useId, useState } from 'react';
import { Link } from 'react-router-dom';
import { toast } from 'sonner';
import type { ImportRowError } from '../../../../shared/schemas/part';
import { Button, buttonClasses } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/field';
import { PageHeader } from '../../../components/ui/page-header';
import { isApiError } from '../../../lib/api-client';
import { errorMessage } from '../../../lib/error-messages';
import { partsTemplateHref, useCommitPartsImport, type ImportPreview } from '../../../api/parts/import-parts';
import { ColumnMapping } from './column-mapping';
import { ImportErrors } from './import-errors';
import { plainMessage, type FieldMapping, type PartField } from './import-mapping';
import { ImportPreviewTable } from './import-preview-table';
import { useCsvImport } from './use-csv-import';

interface CsvImportPageProps {
  jobId: number;
  jobReference: string;
  customer: string;
  onImported: (count: number) => void;
}

/** A refused save names its rows as "rows.4.lengthMm"; shown the same way as a preview's problems. */
function rowErrorsOf(error: unknown): ImportRowError[] {
  if (!isApiError(error)) return [];
  return Object.entries(error.fields).flatMap(([path, message]) => {
    const [, row, field] = path.split('.');
    return path.startsWith('rows.') ? [{ row: Number(row), field: field ?? '', message }] : [];
  });
}

function FilePicker({ fileName, checking, onFile }: { fileName?: string; checking: boolean; onFile: (file: File | null) => void }) {
  const id = useId();
  return (
    <section aria-labelledby={`${id}-heading`} className="mb-6 rounded-panel border border-maple-300 bg-white p-4">
      <h2 id={`${id}-heading`} className="text-lg font-semibold">Choose the cut list</h2>
      <p className="mb-3 max-w-3xl text-maple-700">
        A CSV file of up to 2 MB whose first row names the columns; commas, semicolons or tabs between values. Sizes in mm. Nothing is saved until you
        press Import.{' '}
        <a href={partsTemplateHref} download className="font-semibold text-lacquer-800 underline underline-offset-4">
          Download the template CSV
        </a>
      </p>
      <label htmlFor={id} className="mb-1 block font-medium">CSV file</label>
      <input
        id={id}
        type="file"
        accept=".csv,text/csv,text/plain"
        className="block min-h-touch w-full max-w-md rounded-panel border border-maple-400 bg-white p-2 file:mr-3 file:min-h-9 file:rounded-panel file:border-0 file:bg-lacquer-700 file:px-3 file:font-semibold file:text-white"
        onChange={(event) => {
          onFile(event.target.files?.[0] ?? null);
          // Cleared so choosing the same file again, after fixing it, is noticed.
          event.target.value = '';
        }}
      />
      {fileName && (
        <p role="status" className="mt-2 font-medium">
          {checking ? `Checking ${fileName}…` : `Checked ${fileName}.`}
        </p>
      )}
    </section>
  );
}

interface ImportReviewProps {
  preview: ImportPreview;
  mapping: FieldMapping;
  rowErrors: ImportRowError[];
  checking: boolean;
  saving: boolean;
  onMap: (field: PartField, header: string) => void;
  onSave: () => void;
}

/** The column matches, every problem found, the rows as read, and the button that saves them all. */
function ImportReview({ preview, mapping, rowErrors, checking, saving, onMap, onSave }: ImportReviewProps) {
  const ready = preview.rowCount > 0 && rowErrors.length === 0 && !checking;
  const parts = preview.rowCount === 1 ? 'part' : 'parts';
  return (
    <div className="space-y-6">
      <ColumnMapping headers={preview.headers} mapping={mapping} onMap={onMap} />
      <p className="text-lg font-medium">
        {preview.rowCount === 1 ? '1 row read' : `${preview.rowCount} rows read`}
        {preview.rowCount > preview.preview.length && `; the first ${preview.preview.length} are shown below, but every row is checked`}.
      </p>
      {rowErrors.length > 0 && <ImportErrors errors={rowErrors} />}
      {preview.preview.length > 0 && <ImportPreviewTable preview={{ ...preview, errors: rowErrors }} />}
      <div className="flex flex-wrap items-center gap-3">
        <Button onClick={onSave} disabled={!ready} pending={saving} pendingText="Importing…">
          Import {preview.rowCount} {parts}
        </Button>
        {!ready && !checking && <p className="text-maple-700">Fix every row first; nothing is imported while any row is wrong.</p>}
      </div>
    </div>
  );
}

export function CsvImportPage({ jobId, jobReference, customer, onImported }: CsvImportPageProps) {
  const csv = useCsvImport(jobId);
  const commit = useCommitPartsImport();
  const [commitError, setCommitError] = useState<unknown>(null);
  const refusedRows = rowErrorsOf(commitError);
  const rowErrors = [...(csv.preview?.errors ?? []), ...refusedRows].map((e) => ({ ...e, message: plainMessage(e.field, e.message) }));

  const save = async () => {
    if (!csv.file) return;
    setCommitError(null);
    try {
      const items = await commit.mutateAsync({ jobId, file: csv.file, mapping: csv.mapping });
      toast.success(`${items.length} parts imported into job ${jobReference}.`);
      onImported(items.length);
    } catch (error) {
      setCommitError(error);
    }
  };
  // Any change of file or columns makes an earlier refusal out of date.
  const chooseFile = (file: File | null) => {
    setCommitError(null);
    void csv.chooseFile(file);
  };
  const mapField = (field: PartField, header: string) => {
    setCommitError(null);
    void csv.mapField(field, header);
  };

  return (
    <>
      <PageHeader title="Import a cut list" description={`Into job ${jobReference} · ${customer}`} actions={<Link to={`/jobs/${jobId}`} className={buttonClasses('secondary')}>Back to the job</Link>} />
      <FilePicker fileName={csv.file?.name} checking={csv.checking} onFile={chooseFile} />
      <FormAlert message={csv.problem ?? (commitError && refusedRows.length === 0 ? errorMessage(commitError) : null)} />
      {csv.preview && (
        <ImportReview preview={csv.preview} mapping={csv.mapping} rowErrors={rowErrors} checking={csv.checking} saving={commit.isPending} onMap={mapField} onSave={save} />
      )}
    </>
  );
}
