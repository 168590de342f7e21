import { useCallback, useState } from 'react';
import type { Site } from '../../../../shared/schemas/site';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { PageHeader } from '../../../components/ui/page-header';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { useSiteCounts } from '../../../api/sites/get-site-counts';
import { useSites } from '../../../api/sites/get-sites';
import { SiteForm } from './site-form';
import { SitesTable } from './sites-table';

type Editing = { site?: Site } | null;

/** The owner's list of the group's workshops: add one, rename one, see what each holds. */
export function SitesPage({ homeSiteId }: { homeSiteId: number }) {
  const [editing, setEditing] = useState<Editing>(null);
  const sites = useSites();
  const counts = useSiteCounts();
  const close = () => setEditing(null);
  const rename = useCallback((site: Site) => setEditing({ site }), []);

  return (
    <>
      <PageHeader
        title="Sites"
        description="The workshops of the group. Booths, racks and people each belong to one site; a finishing lead sees and plans their own site, the owner every site."
        actions={<Button onClick={() => setEditing({})}>Add site</Button>}
      />
      {sites.isPending ? (
        <LoadingState what="sites" />
      ) : sites.isError ? (
        <ErrorState error={sites.error} what="the sites" onRetry={() => sites.refetch()} />
      ) : sites.data.items.length === 0 ? (
        <EmptyState title="No sites yet">Add the workshop where the booths stand.</EmptyState>
      ) : (
        <>
          <SitesTable sites={sites.data.items} homeSiteId={homeSiteId} counts={counts.data} onRename={rename} />
          {counts.isError && <p className="mt-2 text-sm text-maple-700">How many booths, racks and people each site has could not be counted just now.</p>}
        </>
      )}
      <Dialog open={editing !== null} onClose={close} title={editing?.site ? `Rename ${editing.site.name}` : 'Add a site'}>
        <SiteForm site={editing?.site} onDone={close} />
      </Dialog>
    </>
  );
}
