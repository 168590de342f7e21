import type { ImportRowError } from '../../../../shared/schemas/part';
import type { ImportPreview } from '../../../api/parts/import-parts';
import { fieldLabel } from './import-mapping';

const th = 'whitespace-nowrap border-b border-maple-300 px-3 py-2 text-sm font-semibold text-maple-800';
const td = 'px-3 py-2';

/** A value as the file gave it; blanks are shown as such so a missing column is obvious. */
function shown(value: unknown): string {
  if (value === undefined || value === null || value === '') return '—';
  if (typeof value === 'boolean') return value ? 'Yes' : 'No';
  return String(value);
}

function problemsByRow(errors: ImportRowError[]): Map<number, string[]> {
  const byRow = new Map<number, string[]>();
  for (const error of errors) {
    const words = error.field ? `${fieldLabel(error.field)}: ${error.message}` : error.message;
    byRow.set(error.row, [...(byRow.get(error.row) ?? []), words]);
  }
  return byRow;
}

const columns = [
  ['label', 'Label'],
  ['kind', 'Kind'],
  ['lengthMm', 'Length'],
  ['widthMm', 'Width'],
  ['thicknessMm', 'Thickness'],
  ['quantity', 'Qty'],
  ['faces', 'Faces'],
  ['edges', 'Edges'],
] as const;

export function ImportPreviewTable({ preview }: { preview: ImportPreview }) {
  const problems = problemsByRow(preview.errors);
  return (
    <div role="region" aria-label="Rows read from the file" tabIndex={0} className="overflow-x-auto rounded-panel border border-maple-300 bg-white">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Rows read from the file</caption>
        <thead className="bg-maple-100">
          <tr>
            <th scope="col" className={th}>Row</th>
            {columns.map(([, name]) => (
              <th key={name} scope="col" className={th}>{name}</th>
            ))}
            <th scope="col" className={th}>Check</th>
          </tr>
        </thead>
        <tbody>
          {preview.preview.map((row) => {
            const rowNumber = Number(row.row);
            const rowProblems = problems.get(rowNumber);
            return (
              <tr key={rowNumber} className={`border-b border-maple-200 ${rowProblems ? 'bg-red-50 outline-2 -outline-offset-2 outline-verdict-stop' : 'even:bg-maple-50'}`}>
                <th scope="row" className={`${td} whitespace-nowrap font-semibold`}>Row {rowNumber}</th>
                {columns.map(([field]) => (
                  <td key={field} className={`${td} whitespace-nowrap`}>{shown(row[field])}</td>
                ))}
                <td className={`${td} min-w-56`}>
                  {rowProblems ? (
                    <span className="font-medium text-verdict-stop"><span aria-hidden="true">⚠ </span>{rowProblems.join('; ')}</span>
                  ) : (
                    <span className="text-verdict-go"><span aria-hidden="true">✓ </span>Good</span>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
