import { csvTemplateHeaders } from '../../../../shared/schemas/part';
import { FieldShell, inputClasses } from '../../../components/ui/field';
import { fieldHints, partFieldLabels, requiredFields, type FieldMapping, type PartField } from './import-mapping';

interface ColumnMappingProps {
  headers: string[];
  mapping: FieldMapping;
  onMap: (field: PartField, header: string) => void;
}

/** One select per field of ours, offering the file's own column names. */
export function ColumnMapping({ headers, mapping, onMap }: ColumnMappingProps) {
  return (
    <fieldset className="rounded-panel border border-maple-300 bg-white p-4">
      <legend className="px-1 text-lg font-semibold">Match the columns</legend>
      <p className="mb-3 text-maple-700">
        For each thing Boothwright needs, pick the column of your file that holds it. Columns with matching names are picked for you.
      </p>
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        {csvTemplateHeaders.map((field) => {
          const missing = requiredFields.has(field) && !mapping[field];
          return (
            <FieldShell key={field} label={partFieldLabels[field]} hint={fieldHints[field]} error={missing ? 'Pick the column for this' : undefined}>
              {(control) => (
                <select className={inputClasses} {...control} value={mapping[field]} onChange={(event) => onMap(field, event.target.value)}>
                  <option value="">Not in the file</option>
                  {headers.map((header) => (
                    <option key={header} value={header}>
                      Column “{header}”
                    </option>
                  ))}
                </select>
              )}
            </FieldShell>
          );
        })}
      </div>
    </fieldset>
  );
}
