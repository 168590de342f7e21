import { useCallback, useState, type ReactNode } from 'react';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Rack } from '../../../../shared/schemas/rack';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { PageHeader } from '../../../components/ui/page-header';
import { Pagination } from '../../../components/ui/pagination';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { useRacks } from '../../../api/racks/get-racks';
import { RackForm, type RackSiteChoice } from './rack-form';
import { RacksTable } from './racks-table';

const pageSize = 50;
type Editing = { rack?: Rack } | null;

interface RacksPageProps {
  units: UnitSystem;
  canWrite: boolean;
  /** For an admin of several sites: the one site looked at (left out: all), and the names and choices of sites. */
  siteId?: number;
  siteNames?: ReadonlyMap<number, string>;
  siteChoice?: RackSiteChoice;
  /** A control beside the page's actions, such as the admin's site switcher. */
  siteSwitcher?: ReactNode;
}

export function RacksPage({ units, canWrite, siteId, siteNames, siteChoice, siteSwitcher }: RacksPageProps) {
  // The page number belongs to the site looked at: another site starts again at page 1.
  const [paging, setPaging] = useState({ siteId, page: 1 });
  const page = paging.siteId === siteId ? paging.page : 1;
  const setPage = (next: number) => setPaging({ siteId, page: next });
  const [editing, setEditing] = useState<Editing>(null);
  const racks = useRacks({ page, pageSize, siteId });
  const close = () => setEditing(null);
  const edit = useCallback((rack: Rack) => setEditing({ rack }), []);

  return (
    <>
      <PageHeader
        title="Racks"
        description="Where parts dry between coats. Shelf space limits how many parts a spray session can take."
        actions={
          <>
            {siteSwitcher}
            {canWrite && <Button onClick={() => setEditing({})}>Add rack</Button>}
          </>
        }
      />
      {racks.isPending ? (
        <LoadingState what="racks" />
      ) : racks.isError ? (
        <ErrorState error={racks.error} what="the racks" onRetry={() => racks.refetch()} />
      ) : racks.data.items.length === 0 ? (
        <EmptyState title={siteId === undefined ? 'No racks yet' : 'No racks at this site yet'}>{canWrite ? 'Add the drying racks so parts have somewhere to go.' : 'The finishing lead or the owner adds racks.'}</EmptyState>
      ) : (
        <>
          <RacksTable racks={racks.data.items} units={units} siteNames={siteNames} onEdit={canWrite ? edit : undefined} />
          <Pagination page={page} pageSize={pageSize} total={racks.data.total} noun="racks" onPage={setPage} />
        </>
      )}
      {canWrite && (
        <Dialog
          open={editing !== null}
          onClose={close}
          title={editing?.rack ? `Edit ${editing.rack.name}` : 'Add a rack'}
          description="Figures are entered in metric units, as they are stored."
        >
          <RackForm rack={editing?.rack} siteChoice={siteChoice} onDone={close} />
        </Dialog>
      )}
    </>
  );
}
