import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Job } from '../../../../shared/schemas/job';
import { DataTable } from '../../../components/ui/data-table';
import { Nowrap } from '../../../components/ui/nowrap';
import { formatQuantity } from '../../../lib/units-display';
import { DueDate } from './due-date';
import { colourAndSheen } from './job-format';
import { JobProgress } from './job-progress';
import { JobStateBadge } from './job-state-badge';

const column = createColumnHelper<Job>();

/** Jobs in the server's order (soonest due first), so the table itself does not re-sort. */
export function JobsTable({ jobs, units, shopToday }: { jobs: Job[]; units: UnitSystem; shopToday: string }) {
  const columns = useMemo(
    () => [
      column.accessor('reference', {
        header: 'Reference',
        cell: ({ row }) => (
          <Link to={`/jobs/${row.original.id}`} className="inline-flex min-h-touch items-center whitespace-nowrap text-lacquer-800 underline underline-offset-4 hover:text-lacquer-600">
            {row.original.reference}
          </Link>
        ),
      }),
      column.accessor('customer', { header: 'Customer' }),
      column.accessor('dueDate', { header: 'Due', cell: ({ row }) => <DueDate job={row.original} shopToday={shopToday} /> }),
      column.accessor('finishSystemName', {
        header: 'Finish',
        cell: ({ row }) => (
          <div className="min-w-44">
            {row.original.finishSystemName ?? <span className="text-maple-700">No finish system yet</span>}
            <span className="block text-sm text-maple-700">{colourAndSheen(row.original)}</span>
          </div>
        ),
      }),
      column.accessor('state', { header: 'State', cell: (info) => <JobStateBadge state={info.getValue()} /> }),
      column.display({ id: 'progress', header: 'Parts through', cell: ({ row }) => <JobProgress job={row.original} /> }),
      column.accessor('coatedAreaM2', { header: 'Coated area', cell: (info) => <Nowrap>{formatQuantity('area', info.getValue(), units)}</Nowrap> }),
    ],
    [units, shopToday],
  );
  const table = useReactTable({ data: jobs, columns, enableSorting: false, getCoreRowModel: getCoreRowModel() });
  return <DataTable table={table} caption="Jobs" />;
}
