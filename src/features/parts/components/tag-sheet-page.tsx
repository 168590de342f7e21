import { Link } from 'react-router-dom';
import { Button, buttonClasses } from '../../../components/ui/button';
import { PageHeader } from '../../../components/ui/page-header';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { useJobParts } from '../../../api/parts/get-job-parts';
import { RackTag } from './rack-tag';
import { useQrCodes } from './use-qr-codes';

interface TagSheetPageProps {
  jobId: number;
  jobReference: string;
  customer: string;
  /** The address scanned codes open, e.g. https://booth.example; from the route, which knows the window. */
  origin: string;
}

// Only this page prints, so its page margins are set here rather than for the whole app.
const printPage = '@page { margin: 10mm; }';

export function TagSheetPage({ jobId, jobReference, customer, origin }: TagSheetPageProps) {
  const parts = useJobParts(jobId);
  const items = parts.data?.items ?? [];
  const qr = useQrCodes(items.map((part) => `${origin}/parts/${part.id}`));

  const header = (
    <div className="print:hidden">
      <PageHeader
        title={`Rack tags for job ${jobReference}`}
        description="One tag per part line. Print on plain A4 or US Letter and cut along the dashed lines, or on 3-across label sheets. Scanning a tag opens the part in Boothwright."
        actions={
          <>
            <Link to={`/jobs/${jobId}`} className={buttonClasses('secondary')}>Back to the job</Link>
            <Button onClick={() => window.print()} disabled={!qr.images || items.length === 0}>Print tags</Button>
          </>
        }
      />
    </div>
  );

  if (parts.isPending) return <>{header}<LoadingState what="parts" /></>;
  if (parts.isError) return <>{header}<ErrorState error={parts.error} what="the parts" onRetry={() => parts.refetch()} /></>;
  if (items.length === 0) return <>{header}<EmptyState title="No parts to tag">Add parts to the job first.</EmptyState></>;
  return (
    <>
      <style>{printPage}</style>
      {header}
      {qr.failed && (
        <p role="alert" className="rounded-panel border-2 border-verdict-stop bg-white p-4 font-medium">
          Could not make the QR codes in this browser. Reload the page to try again.
        </p>
      )}
      {!qr.images && !qr.failed && <LoadingState what="QR codes" />}
      {qr.images && (
        <ul aria-label="Rack tags" className="grid grid-cols-[repeat(auto-fill,60mm)] gap-[3mm] print:grid-cols-[repeat(3,60mm)] print:justify-center">
          {items.map((part) => (
            <RackTag key={part.id} part={part} jobReference={jobReference} customer={customer} qrSrc={qr.images?.get(`${origin}/parts/${part.id}`) ?? ''} />
          ))}
        </ul>
      )}
    </>
  );
}
