import { useCallback, useState, type ReactNode } from 'react';
import type { Booth } from '../../../../shared/schemas/booth';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { PageHeader } from '../../../components/ui/page-header';
import { Pagination } from '../../../components/ui/pagination';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { useBooths } from '../../../api/booths/get-booths';
import { BoothForm, type BoothSiteChoice } from './booth-form';
import { BoothsTable } from './booths-table';

const pageSize = 50;
type Editing = { booth?: Booth } | null;

interface BoothsPageProps {
  units: UnitSystem;
  canWrite: boolean;
  /** For an admin of several sites: the one site looked at (left out: all), and the names and choices of sites. */
  siteId?: number;
  siteNames?: ReadonlyMap<number, string>;
  siteChoice?: BoothSiteChoice;
  /** A control beside the page's actions, such as the admin's site switcher. */
  siteSwitcher?: ReactNode;
}

export function BoothsPage({ units, canWrite, siteId, siteNames, siteChoice, siteSwitcher }: BoothsPageProps) {
  // The page number belongs to the site looked at: another site starts again at page 1.
  const [paging, setPaging] = useState({ siteId, page: 1 });
  const page = paging.siteId === siteId ? paging.page : 1;
  const setPage = (next: number) => setPaging({ siteId, page: next });
  const [editing, setEditing] = useState<Editing>(null);
  const booths = useBooths({ page, pageSize, siteId });
  const close = () => setEditing(null);
  const edit = useCallback((booth: Booth) => setEditing({ booth }), []);

  return (
    <>
      <PageHeader
        title="Booths"
        description="Each booth or spray room, its air and when it is open. Clearance time is how long the air takes to fall to 1 % after spraying stops."
        actions={
          <>
            {siteSwitcher}
            {canWrite && <Button onClick={() => setEditing({})}>Add booth</Button>}
          </>
        }
      />
      {booths.isPending ? (
        <LoadingState what="booths" />
      ) : booths.isError ? (
        <ErrorState error={booths.error} what="the booths" onRetry={() => booths.refetch()} />
      ) : booths.data.items.length === 0 ? (
        <EmptyState title={siteId === undefined ? 'No booths yet' : 'No booths at this site yet'}>
          {canWrite ? 'Add the first booth to start planning spray sessions.' : 'The finishing lead or the owner adds booths.'}
        </EmptyState>
      ) : (
        <>
          <BoothsTable booths={booths.data.items} units={units} siteNames={siteNames} onEdit={canWrite ? edit : undefined} />
          <Pagination page={page} pageSize={pageSize} total={booths.data.total} noun="booths" onPage={setPage} />
        </>
      )}
      {canWrite && (
        <Dialog
          open={editing !== null}
          onClose={close}
          wide
          title={editing?.booth ? `Edit ${editing.booth.name}` : 'Add a booth'}
          description="Figures are entered in metric units, as they are stored."
        >
          <BoothForm booth={editing?.booth} siteChoice={siteChoice} onDone={close} />
        </Dialog>
      )}
    </>
  );
}
