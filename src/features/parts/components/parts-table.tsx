import { createColumnHelper, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Part } from '../../../../shared/schemas/part';
import { Button } from '../../../components/ui/button';
import { DataTable } from '../../../components/ui/data-table';
import { Nowrap } from '../../../components/ui/nowrap';
import { formatQuantity } from '../../../lib/units-display';
import { facesWords, partSize, rackPlace, spacedTag } from './part-format';
import { PartStateBadge } from './part-state-badge';

const column = createColumnHelper<Part>();

interface PartsTableProps {
  parts: Part[];
  units: UnitSystem;
  onEdit?: (part: Part) => void;
}

function editColumn(onEdit: (part: Part) => void) {
  return column.display({
    id: 'actions',
    header: () => <span className="sr-only">Actions</span>,
    cell: ({ row }) => (
      <Button variant="secondary" onClick={() => onEdit(row.original)} aria-label={`Edit ${row.original.label}`}>
        Edit
      </Button>
    ),
  });
}

export function PartsTable({ parts, units, onEdit }: PartsTableProps) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const columns = useMemo(
    () => [
      column.accessor('label', {
        header: 'Label and kind',
        cell: ({ row }) => (
          <>
            <Link to={`/parts/${row.original.id}`} className="inline-flex min-h-touch items-center whitespace-nowrap text-lacquer-800 underline underline-offset-4 hover:text-lacquer-600">
              {row.original.label}
            </Link>
            {row.original.kind && <span className="block text-sm font-normal text-maple-700">{row.original.kind}</span>}
          </>
        ),
      }),
      column.accessor('lengthMm', { header: 'Size (mm) L × W × T', enableSorting: false, cell: ({ row }) => <Nowrap>{partSize(row.original, false)}</Nowrap> }),
      column.accessor('quantity', { header: 'Qty', enableSorting: false }),
      column.display({ id: 'surfaces', header: 'Coated surfaces', cell: ({ row }) => <span className="block min-w-24 text-sm">{facesWords(row.original)}</span> }),
      column.accessor('coatedAreaM2', {
        header: 'Coated area',
        cell: ({ row }) => (
          <span className="block whitespace-nowrap">
            {formatQuantity('area', row.original.pieceAreaM2, units)} each
            <span className="block text-sm text-maple-700">{formatQuantity('area', row.original.coatedAreaM2, units)} in all</span>
          </span>
        ),
      }),
      column.accessor('tag', { header: 'Tag', enableSorting: false, cell: (info) => <span className="whitespace-nowrap font-mono">{spacedTag(info.getValue())}</span> }),
      column.accessor('state', {
        header: 'State and rack',
        cell: ({ row }) => (
          <span className="block min-w-32">
            <PartStateBadge state={row.original.state} />
            <span className="mt-1 block text-sm">{rackPlace(row.original)}</span>
          </span>
        ),
      }),
      ...(onEdit ? [editColumn(onEdit)] : []),
    ],
    [units, onEdit],
  );
  const table = useReactTable({ data: parts, columns, state: { sorting }, onSortingChange: setSorting, getCoreRowModel: getCoreRowModel(), getSortedRowModel: getSortedRowModel() });
  return <DataTable table={table} caption="Parts of this job" />;
}
