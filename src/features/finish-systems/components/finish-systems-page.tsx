import { useMemo, useState } from 'react';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { FinishSystem } from '../../../../shared/schemas/finish-system';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { PageHeader } from '../../../components/ui/page-header';
import { Pagination } from '../../../components/ui/pagination';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { TemperatureField } from '../../../components/ui/temperature-field';
import { useFinishSystems } from '../../../api/finish-systems/get-finish-systems';
import type { CoatingProducts } from './coating-products';
import { FinishSystemCard } from './finish-system-card';
import { FinishSystemForm } from './finish-system-form';

const pageSize = 20;
type Editing = { system?: FinishSystem } | null;

interface FinishSystemsPageProps {
  units: UnitSystem;
  canWrite: boolean;
  coating: CoatingProducts;
  planningTempC: number;
}

function ProductsNotice({ coating }: { coating: CoatingProducts }) {
  if (coating.status === 'loading') return <LoadingState what="the data sheets for the totals" />;
  if (coating.status === 'error') return <ErrorState error={coating.error} what="the data sheets for the totals" onRetry={coating.retry} />;
  return null;
}

export function FinishSystemsPage({ units, canWrite, coating, planningTempC }: FinishSystemsPageProps) {
  const [page, setPage] = useState(1);
  const [editing, setEditing] = useState<Editing>(null);
  const [tempC, setTempC] = useState(planningTempC);
  const systems = useFinishSystems({ page, pageSize });
  const products = coating.status === 'ready' ? coating.products : null;
  const byId = useMemo(() => (products ? new Map(products.map((p) => [p.id, p])) : null), [products]);
  const close = () => setEditing(null);

  return (
    <>
      <PageHeader
        title="Finish systems"
        description="The steps a part goes through, in order: which product at what dry film, and where to denib. Jobs name the system they use."
        actions={canWrite && <Button onClick={() => setEditing({})} disabled={!products}>Add finish system</Button>}
      />
      <ProductsNotice coating={coating} />
      {byId && <TemperatureField label="Drying temperature for the times below" valueC={tempC} onChange={setTempC} units={units} className="mb-4 max-w-sm" />}
      {systems.isPending ? (
        <LoadingState what="finish systems" />
      ) : systems.isError ? (
        <ErrorState error={systems.error} what="the finish systems" onRetry={() => systems.refetch()} />
      ) : systems.data.items.length === 0 ? (
        <EmptyState title="No finish systems yet">{canWrite ? 'Add the first system from the data sheets you have.' : 'The finishing lead or the owner sets up finish systems.'}</EmptyState>
      ) : (
        <>
          <ul className="space-y-4">
            {systems.data.items.map((system) => (
              <li key={system.id}>
                <FinishSystemCard system={system} units={units} products={byId} tempC={tempC} onEdit={canWrite && products ? (s) => setEditing({ system: s }) : undefined} />
              </li>
            ))}
          </ul>
          <Pagination page={page} pageSize={pageSize} total={systems.data.total} noun="finish systems" onPage={setPage} />
        </>
      )}
      {canWrite && products && (
        <Dialog open={editing !== null} onClose={close} wide title={editing?.system ? `Edit ${editing.system.name}` : 'Add a finish system'}>
          <FinishSystemForm system={editing?.system} products={products} units={units} startTempC={tempC} onDone={close} />
        </Dialog>
      )}
    </>
  );
}
