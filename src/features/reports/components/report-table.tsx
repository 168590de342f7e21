import type { ReactNode } from 'react';

export interface ReportColumn<T> {
  header: string;
  cell: (row: T) => ReactNode;
  /** Figures line up on the right, in tabular digits. */
  numeric?: boolean;
}

interface ReportTableProps<T> {
  caption: string;
  columns: ReportColumn<T>[];
  rows: T[];
  rowKey: (row: T) => string;
  /** A totals row, cell by cell under the columns. */
  footer?: ReactNode[];
}

const cellClasses = (numeric?: boolean) => `px-3 py-2 ${numeric ? 'text-right tabular-nums whitespace-nowrap' : ''}`;

/**
 * The figures behind a chart, and its accessible equivalent: a real table with a caption and
 * header cells. On screen a long table scrolls inside its box; on paper it runs in full.
 */
export function ReportTable<T>({ caption, columns, rows, rowKey, footer }: ReportTableProps<T>) {
  return (
    <div role="region" aria-label={caption} tabIndex={0} className="max-h-[32rem] overflow-auto rounded-panel border border-maple-300 bg-white print:max-h-none print:overflow-visible print:border-0">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="px-3 py-2 text-left text-base font-semibold text-lacquer-900">{caption}</caption>
        <thead className="sticky top-0 bg-maple-100 print:static">
          <tr>
            {columns.map((column) => (
              <th key={column.header} scope="col" className={`border-b border-maple-300 font-semibold text-maple-800 ${cellClasses(column.numeric)}`}>
                {column.header}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={rowKey(row)} className="border-b border-maple-200 last:border-b-0 even:bg-maple-50 print:break-inside-avoid">
              {columns.map((column, index) =>
                index === 0 ? (
                  <th key={column.header} scope="row" className={`whitespace-nowrap font-semibold ${cellClasses(column.numeric)}`}>
                    {column.cell(row)}
                  </th>
                ) : (
                  <td key={column.header} className={cellClasses(column.numeric)}>
                    {column.cell(row)}
                  </td>
                ),
              )}
            </tr>
          ))}
        </tbody>
        {footer && (
          <tfoot className="print:table-row-group border-t-2 border-maple-400 bg-maple-100 font-semibold">
            <tr>
              {footer.map((content, index) =>
                index === 0 ? (
                  <th key={index} scope="row" className={cellClasses(columns[index]?.numeric)}>
                    {content}
                  </th>
                ) : (
                  <td key={index} className={cellClasses(columns[index]?.numeric)}>
                    {content}
                  </td>
                ),
              )}
            </tr>
          </tfoot>
        )}
      </table>
    </div>
  );
}
