import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { DataTable } from '../../../components/ui/data-table';
import { PageHeader } from '../../../components/ui/page-header';
import { Pagination } from '../../../components/ui/pagination';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { formatShopDateTime } from '../../../lib/shop-time';
import type { AuditEntry } from '../../../../shared/schemas/audit';
import { useAudit } from '../../../api/audit/get-audit';
import { upperFirst } from '../../../../shared/words';

const pageSize = 50;
const column = createColumnHelper<AuditEntry>();

export function AuditPage({ timeZone }: { timeZone: string }) {
  const [page, setPage] = useState(1);
  const audit = useAudit({ page, pageSize });
  const columns = useMemo(
    () => [
      column.accessor('at', { header: 'When', cell: (info) => <span className="whitespace-nowrap">{formatShopDateTime(info.getValue(), timeZone)}</span> }),
      column.accessor('userName', { header: 'Who', cell: (info) => info.getValue() ?? 'System' }),
      column.accessor('summary', { header: 'What happened' }),
      // The summary names the thing as people do; the record's kind says where to find it, never its database id.
      column.accessor((entry) => upperFirst(entry.entity.replace(/-/g, ' ')), { id: 'record', header: 'Kind of record' }),
    ],
    [timeZone],
  );
  const table = useReactTable({ data: audit.data?.items ?? [], columns, getCoreRowModel: getCoreRowModel(), enableSorting: false });

  return (
    <>
      <PageHeader title="Activity log" description="Who changed what, newest first. Entries cannot be edited." />
      {audit.isPending ? (
        <LoadingState what="the activity log" />
      ) : audit.isError ? (
        <ErrorState error={audit.error} what="the activity log" onRetry={() => audit.refetch()} />
      ) : audit.data.items.length === 0 ? (
        <EmptyState title="Nothing recorded yet" />
      ) : (
        <>
          <DataTable table={table} caption="Activity log" />
          <Pagination page={page} pageSize={pageSize} total={audit.data.total} noun="entries" onPage={setPage} />
        </>
      )}
    </>
  );
}
