import type { ImportRowError } from '../../../../shared/schemas/part';
import { fieldLabel } from './import-mapping';

/** Every problem in words, row by row, with row numbers as the spreadsheet shows them. */
export function ImportErrors({ errors }: { errors: ImportRowError[] }) {
  const rows = new Set(errors.map((e) => e.row)).size;
  return (
    <div role="alert" className="rounded-panel border-2 border-verdict-stop bg-white p-4">
      <p className="font-semibold text-verdict-stop">
        <span aria-hidden="true">⚠ </span>
        {rows === 1 ? '1 row needs fixing' : `${rows} rows need fixing`} before anything can be imported. Fix the file and choose it again, or change the
        column matches.
      </p>
      <ul className="mt-2 list-disc space-y-1 pl-6">
        {errors.slice(0, 50).map((error) => (
          <li key={`${error.row}-${error.field}-${error.message}`}>
            Row {error.row}
            {error.field && error.field !== 'file' ? `, ${fieldLabel(error.field).toLowerCase()}` : ''}: {error.message}
          </li>
        ))}
      </ul>
      {errors.length > 50 && <p className="mt-2">…and {errors.length - 50} more.</p>}
    </div>
  );
}
