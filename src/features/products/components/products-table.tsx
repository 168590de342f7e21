import { createColumnHelper, getCoreRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { chemistryLabels, productSortFields, type Product, type ProductListQuery } from '../../../../shared/schemas/product';
import { DataTable } from '../../../components/ui/data-table';
import { Nowrap } from '../../../components/ui/nowrap';
import { formatMinutes } from '../../../lib/durations';
import { formatNumber, formatQuantity } from '../../../lib/units-display';
import { DocumentLinks, HazardWords, LotWords } from './product-cells';
import { productKindLabels } from './product-format';

const column = createColumnHelper<Product>();

export type ProductSort = Pick<ProductListQuery, 'sort' | 'dir'>;

interface ProductsTableProps {
  products: Product[];
  units: UnitSystem;
  timeZone: string;
  sort: ProductSort;
  onSort: (sort: ProductSort) => void;
}

/** The day in the shop's timezone; the time of an edit does not matter in a list. */
const formatDay = (iso: string, timeZone: string) => new Intl.DateTimeFormat('en-GB', { timeZone, day: 'numeric', month: 'short', year: 'numeric' }).format(new Date(iso));

const isSortField = (id: string): id is ProductSort['sort'] => (productSortFields as readonly string[]).includes(id);

/** A two-word header over a narrow column may wrap, so all ten columns fit a 1366 px laptop without scrolling. */
const TwoLineHeader = ({ children }: { children: string }) => <span className="inline-block whitespace-normal">{children}</span>;

function useProductColumns(units: UnitSystem, timeZone: string) {
  return useMemo(
    () => [
      column.accessor('name', {
        header: 'Name',
        cell: ({ row }) => (
          <span className="block min-w-32">
            <Link to={`/data-sheets/${row.original.id}`} className="text-lacquer-800 underline underline-offset-2">
              {row.original.name}
            </Link>
            {row.original.makerRef && <span className="block text-sm font-normal text-maple-700">{row.original.makerRef}</span>}
          </span>
        ),
      }),
      column.accessor('kind', { header: 'Kind', cell: (info) => productKindLabels[info.getValue()] }),
      column.accessor('chemistry', { header: 'Chemistry', cell: (info) => chemistryLabels[info.getValue()] }),
      column.accessor('volumeSolidsPct', { header: () => <TwoLineHeader>Volume solids</TwoLineHeader>, enableSorting: false, cell: (info) => <Nowrap>{formatNumber(info.getValue())} %</Nowrap> }),
      column.accessor('vocGPerL', {
        header: 'VOC',
        enableSorting: false,
        cell: (info) => (info.getValue() === null ? <span className="text-maple-700">Not given</span> : <Nowrap>{formatQuantity('vocContent', info.getValue()!, units)}</Nowrap>),
      }),
      column.accessor('potLifeMin', {
        header: 'Pot life',
        enableSorting: false,
        cell: (info) => (info.getValue() === null ? <span className="text-maple-700">None given</span> : <Nowrap>{formatMinutes(info.getValue()!)}</Nowrap>),
      }),
      column.accessor('hazards', { header: 'Hazards', enableSorting: false, cell: (info) => <HazardWords hazards={info.getValue()} /> }),
      column.accessor('lots', { header: 'Lots', enableSorting: false, cell: (info) => <LotWords lots={info.getValue()} /> }),
      column.display({ id: 'documents', header: () => <TwoLineHeader>Data sheets</TwoLineHeader>, cell: ({ row }) => <DocumentLinks product={row.original} /> }),
      column.accessor('updatedAt', { header: 'Updated', sortDescFirst: true, cell: (info) => <Nowrap>{formatDay(info.getValue(), timeZone)}</Nowrap> }),
    ],
    [units, timeZone],
  );
}

/** Sorting happens on the server (the list is paged), so the table only reports which header was pressed. */
export function ProductsTable({ products, units, timeZone, sort, onSort }: ProductsTableProps) {
  const columns = useProductColumns(units, timeZone);
  const sorting: SortingState = [{ id: sort.sort, desc: sort.dir === 'desc' }];
  const table = useReactTable({
    data: products,
    columns,
    state: { sorting },
    manualSorting: true,
    enableSortingRemoval: false,
    onSortingChange: (updater) => {
      const next = typeof updater === 'function' ? updater(sorting) : updater;
      const first = next[0];
      if (first && isSortField(first.id)) onSort({ sort: first.id, dir: first.desc ? 'desc' : 'asc' });
    },
    getCoreRowModel: getCoreRowModel(),
  });
  return <DataTable table={table} caption="Data sheets" />;
}
