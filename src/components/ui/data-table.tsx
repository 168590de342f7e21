import { flexRender, type Table } from '@tanstack/react-table';

interface DataTableProps<T> {
  table: Table<T>;
  caption: string;
}

const sortWords = { asc: 'ascending', desc: 'descending' } as const;

/** A plain, scrollable table with real headers; sortable columns get a button and aria-sort. */
export function DataTable<T>({ table, caption }: DataTableProps<T>) {
  return (
    <div role="region" aria-label={caption} tabIndex={0} className="relative overflow-x-auto rounded-panel border border-maple-300 bg-white">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-maple-100">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                const title = flexRender(header.column.columnDef.header, header.getContext());
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={sorted ? sortWords[sorted] : undefined}
                    className="whitespace-nowrap border-b border-maple-300 px-3 py-2 text-sm font-semibold text-maple-800"
                  >
                    {header.isPlaceholder ? null : header.column.getCanSort() ? (
                      <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex min-h-touch items-center gap-1 font-semibold">
                        {title}
                        <span aria-hidden="true">{sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}</span>
                      </button>
                    ) : (
                      title
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-maple-200 last:border-b-0 even:bg-maple-50">
              {row.getVisibleCells().map((cell, index) => {
                const content = flexRender(cell.column.columnDef.cell, cell.getContext());
                return index === 0 ? (
                  <th key={cell.id} scope="row" className="px-3 py-2 font-semibold">
                    {content}
                  </th>
                ) : (
                  <td key={cell.id} className="px-3 py-2 align-middle">
                    {content}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
