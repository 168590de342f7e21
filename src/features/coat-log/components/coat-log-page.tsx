import { useState } from 'react';
import { toast } from 'sonner';
import type { Coat } from '../../../../shared/schemas/coat';
import type { CoatPhoto } from '../../../../shared/schemas/coat-photo';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { PageHeader } from '../../../components/ui/page-header';
import { Pagination } from '../../../components/ui/pagination';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { errorMessage } from '../../../lib/error-messages';
import type { CoatFilters } from '../../../api/coats/coat-keys';
import { getAllCoats, useCoats } from '../../../api/coats/get-coats';
import { useCoatPhotos } from '../../../api/coat-photos/get-coat-photos';
import { usePageDenibs } from '../api/get-page-denibs';
import { formatShopDateTime } from '../../../lib/shop-time';
import { AddPhotoForm } from './add-photo-form';
import { PhotoView } from './coat-photos';
import { coatsToCsv, downloadCsv } from './coat-csv';
import { CoatLogFilters, type CoatLogFilterValues } from './coat-log-filters';
import { coatNameWords, shopDayStart } from './coat-log-format';
import { CoatLogCards } from './coat-log-cards';
import { CoatLogTable } from './coat-log-table';
import { CorrectionForm } from './correction-form';
import { useShopFormat } from '../../../api/settings/use-shop-format';

const pageSize = 25;

function toQuery(filters: CoatLogFilterValues, timeZone: string): Omit<CoatFilters, 'page' | 'pageSize'> {
  return { jobId: filters.jobId, productId: filters.productId, from: shopDayStart(filters.from, timeZone), to: shopDayStart(filters.to, timeZone, 1), history: filters.history };
}

interface CoatLogPageProps {
  filters: CoatLogFilterValues;
  page: number;
  onChange: (filters: CoatLogFilterValues, page: number) => void;
  canCorrect: boolean;
  units: UnitSystem;
  timeZone: string;
}

/** Every coat with its conditions, film and warnings; filters live in the address so a view can be shared. */
export function CoatLogPage({ filters, page, onChange, canCorrect, units, timeZone }: CoatLogPageProps) {
  const query = toQuery(filters, timeZone);
  const coats = useCoats({ ...query, page, pageSize });
  const denibs = usePageDenibs(query, page, pageSize, coats.data);
  const [correcting, setCorrecting] = useState<Coat | null>(null);
  const [photoFor, setPhotoFor] = useState<Coat | null>(null);
  const [viewing, setViewing] = useState<{ photo: CoatPhoto; coat: Coat } | null>(null);
  const shop = { ...useShopFormat(), timeZone };
  const photos = useCoatPhotos(coats.data?.items.map((c) => c.id) ?? []);
  const photosOf = (coat: Coat) => (photos.data ?? []).filter((p) => p.shownWithCoatId === coat.id);
  const photoProps = { photosOf, onOpenPhoto: (photo: CoatPhoto, coat: Coat) => setViewing({ photo, coat }), onAddPhoto: canCorrect ? setPhotoFor : undefined };
  const [exporting, setExporting] = useState(false);

  const exportCsv = async () => {
    setExporting(true);
    try {
      const all = await getAllCoats(query);
      downloadCsv(coatsToCsv(all, timeZone), `coat-log-${new Date().toISOString().slice(0, 10)}.csv`);
      toast.success(`${all.length} coat records exported.`);
    } catch (error) {
      toast.error(errorMessage(error));
    } finally {
      setExporting(false);
    }
  };

  return (
    <>
      <PageHeader
        title="Coat log"
        description="The record of every coat and every denib between coats: product, film, conditions, warnings, photos and who did it. Corrections and photos add to the record; nothing is deleted."
        actions={
          <Button variant="secondary" onClick={exportCsv} pending={exporting} pendingText="Exporting…" disabled={!coats.data || coats.data.total === 0}>
            Export CSV
          </Button>
        }
      />
      <CoatLogFilters value={filters} onChange={(next) => onChange(next, 1)} />
      {coats.isPending ? (
        <LoadingState what="the coat log" />
      ) : coats.isError ? (
        <ErrorState error={coats.error} what="the coat log" onRetry={() => coats.refetch()} />
      ) : coats.data.items.length === 0 && denibs.length === 0 ? (
        <EmptyState title="No coats match">Coats appear here as sprayers record them in their spray sessions. Try wider filters.</EmptyState>
      ) : (
        <>
          {/* Eleven columns need a wide screen; below that each coat is a card. Only one of the two is ever displayed. */}
          <div className="hidden xl:block">
            <CoatLogTable coats={coats.data.items} denibs={denibs} units={units} timeZone={timeZone} onCorrect={canCorrect ? setCorrecting : undefined} {...photoProps} />
          </div>
          <div className="xl:hidden">
            <CoatLogCards coats={coats.data.items} denibs={denibs} units={units} timeZone={timeZone} onCorrect={canCorrect ? setCorrecting : undefined} {...photoProps} />
          </div>
          <Pagination page={page} pageSize={pageSize} total={coats.data.total} noun={filters.history ? 'coat versions' : 'coats'} onPage={(next) => onChange(filters, next)} />
        </>
      )}
      <Dialog open={correcting !== null} onClose={() => setCorrecting(null)} wide title={correcting ? `Correct ${coatNameWords(correcting, shop)}` : 'Correct a coat'} description="Change what was recorded wrongly. Figures are entered in metric units, as they are stored.">
        {correcting && <CorrectionForm coat={correcting} onDone={() => setCorrecting(null)} />}
      </Dialog>
      <Dialog open={photoFor !== null} onClose={() => setPhotoFor(null)} title={photoFor ? `Add a photo to ${coatNameWords(photoFor, shop)}` : 'Add a photo'} description="A defect, a sample board or the finish as sprayed. The photo is kept as its own record; the coat is not changed.">
        {photoFor && <AddPhotoForm coat={photoFor} onDone={() => setPhotoFor(null)} />}
      </Dialog>
      <Dialog open={viewing !== null} onClose={() => setViewing(null)} wide title={viewing ? `Photo of ${coatNameWords(viewing.coat, shop)}` : 'Photo'}>
        {viewing && <PhotoView photo={viewing.photo} when={formatShopDateTime(viewing.photo.takenAt, timeZone)} />}
      </Dialog>
    </>
  );
}
