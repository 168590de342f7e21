import { createColumnHelper, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { rackLocationLabels, type Rack } from '../../../../shared/schemas/rack';
import { Button } from '../../../components/ui/button';
import { Nowrap } from '../../../components/ui/nowrap';
import { DataTable } from '../../../components/ui/data-table';
import { formatQuantity } from '../../../lib/units-display';

const column = createColumnHelper<Rack>();

interface RacksTableProps {
  racks: Rack[];
  units: UnitSystem;
  /** Site names by id when the racks shown may be on several sites; left out, no Site column. */
  siteNames?: ReadonlyMap<number, string>;
  onEdit?: (rack: Rack) => void;
}

export function RacksTable({ racks, units, siteNames, onEdit }: RacksTableProps) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const columns = useMemo(
    () => [
      column.accessor('name', { header: 'Name' }),
      ...(siteNames ? [column.accessor((rack) => siteNames.get(rack.siteId) ?? `Site ${rack.siteId}`, { id: 'site', header: 'Site' })] : []),
      column.accessor((rack) => rackLocationLabels[rack.location], { id: 'location', header: 'Where' }),
      column.accessor('shelves', { header: 'Shelves' }),
      column.accessor('shelfAreaM2', { header: 'Shelf area', cell: (info) => <Nowrap>{formatQuantity('area', info.getValue(), units)}</Nowrap> }),
      column.accessor('totalAreaM2', { header: 'Total area', cell: (info) => <Nowrap>{formatQuantity('area', info.getValue(), units)}</Nowrap> }),
      column.accessor('dryingTempC', {
        header: 'Drying temperature',
        sortUndefined: 'last',
        cell: (info) => {
          const temp = info.getValue();
          return temp === null ? <span className="text-maple-700">Unheated</span> : `Heated to ${formatQuantity('temperature', temp, units)}`;
        },
      }),
      ...(onEdit
        ? [
            column.display({
              id: 'actions',
              header: () => <span className="sr-only">Actions</span>,
              cell: ({ row }) => (
                <Button variant="secondary" onClick={() => onEdit(row.original)} aria-label={`Edit ${row.original.name}`}>
                  Edit
                </Button>
              ),
            }),
          ]
        : []),
    ],
    [units, siteNames, onEdit],
  );

  const table = useReactTable({
    data: racks,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });

  return <DataTable table={table} caption="Drying racks" />;
}
