import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo } from 'react';
import type { Site } from '../../../../shared/schemas/site';
import { Button } from '../../../components/ui/button';
import { DataTable } from '../../../components/ui/data-table';
import type { SiteCounts } from '../../../api/sites/get-site-counts';

const column = createColumnHelper<Site>();

interface SitesTableProps {
  sites: Site[];
  homeSiteId: number;
  /** Left out while the counts load or when they could not be had: the names still show. */
  counts?: SiteCounts;
  onRename: (site: Site) => void;
}

const countColumn = (id: keyof SiteCounts, header: string, counts: SiteCounts) =>
  column.accessor((site) => counts[id].get(site.id) ?? 0, { id, header });

export function SitesTable({ sites, homeSiteId, counts, onRename }: SitesTableProps) {
  const columns = useMemo(
    () => [
      column.accessor('name', { header: 'Name', cell: (info) => (info.row.original.id === homeSiteId ? `${info.getValue()} (your site)` : info.getValue()) }),
      ...(counts ? [countColumn('booths', 'Booths', counts), countColumn('racks', 'Racks', counts), countColumn('users', 'People', counts)] : []),
      column.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        cell: ({ row }) => (
          <Button variant="secondary" onClick={() => onRename(row.original)} aria-label={`Rename ${row.original.name}`}>
            Rename
          </Button>
        ),
      }),
    ],
    [homeSiteId, counts, onRename],
  );
  const table = useReactTable({ data: sites, columns, getCoreRowModel: getCoreRowModel(), enableSorting: false });
  return <DataTable table={table} caption="Sites" />;
}
