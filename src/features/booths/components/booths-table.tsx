import { createColumnHelper, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { boothKindLabels, type Booth } from '../../../../shared/schemas/booth';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { Button } from '../../../components/ui/button';
import { Nowrap } from '../../../components/ui/nowrap';
import { DataTable } from '../../../components/ui/data-table';
import { formatNumber, formatQuantity } from '../../../lib/units-display';
import { faceVelocityShortfall, summariseOpeningHours } from './booth-format';

const column = createColumnHelper<Booth>();

interface BoothsTableProps {
  booths: Booth[];
  units: UnitSystem;
  /** Site names by id when the booths shown may be on several sites; left out, no Site column. */
  siteNames?: ReadonlyMap<number, string>;
  onEdit?: (booth: Booth) => void;
}

function FaceVelocity({ booth, units }: { booth: Booth; units: UnitSystem }) {
  if (booth.faceVelocityMps === null) return <span className="text-maple-700">Not known (needs open-face area)</span>;
  const value = formatQuantity('airSpeed', booth.faceVelocityMps, units);
  if (!faceVelocityShortfall(booth)) return <Nowrap>{value}</Nowrap>;
  return (
    <span className="font-semibold text-verdict-caution">
      <span aria-hidden="true">⚠ </span>
      {value}, below the {formatQuantity('airSpeed', booth.minFaceVelocityMps, units)} minimum
    </span>
  );
}

export function BoothsTable({ booths, units, siteNames, onEdit }: BoothsTableProps) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const columns = useMemo(
    () => [
      column.accessor('name', { header: 'Name' }),
      ...(siteNames ? [column.accessor((booth) => siteNames.get(booth.siteId) ?? `Site ${booth.siteId}`, { id: 'site', header: 'Site' })] : []),
      column.accessor((booth) => boothKindLabels[booth.kind], { id: 'kind', header: 'Kind' }),
      column.accessor('volumeM3', { header: 'Volume', cell: (info) => <Nowrap>{formatQuantity('roomVolume', info.getValue(), units)}</Nowrap> }),
      column.accessor('extractionM3PerH', { header: 'Extraction', cell: (info) => <Nowrap>{formatQuantity('airflow', info.getValue(), units)}</Nowrap> }),
      column.accessor('mixingFactorK', { header: () => <abbr title="Mixing factor: how evenly the booth's air mixes">Mixing K</abbr>, cell: (info) => formatNumber(info.getValue()) }),
      column.accessor('clearanceMin', {
        header: 'Clearance time',
        cell: ({ row }) => (
          <span className="whitespace-nowrap">
            {formatNumber(row.original.clearanceMin, 1)} min{' '}
            <span className="text-sm text-maple-700">({row.original.clearanceSource === 'measured' ? 'measured' : 'computed'})</span>
          </span>
        ),
      }),
      column.accessor('faceVelocityMps', { header: 'Face velocity', sortUndefined: 'last', cell: ({ row }) => <FaceVelocity booth={row.original} units={units} /> }),
      column.accessor('sprayRateM2PerH', { header: 'Spray rate', cell: (info) => <Nowrap>{formatQuantity('areaRate', info.getValue(), units)}</Nowrap> }),
      column.display({ id: 'hours', header: 'Opening hours', cell: ({ row }) => <span className="text-sm">{summariseOpeningHours(row.original.openingHours)}</span> }),
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
    data: booths,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });

  return (
    <>
      <DataTable table={table} caption="Booths" />
      <p className="mt-2 text-sm text-maple-800">
        Mixing K says how evenly the booth's air mixes, from 1 (perfect mixing) to 10 (poor, with dead corners). The clearance time is K × volume ÷ extraction × ln 100: the time
        for the vapour to fall to 1 % after spraying stops, unless a measured time is set.
      </p>
    </>
  );
}
