import { Link } from 'react-router-dom';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { chemistryLabels } from '../../../../shared/schemas/product';
import { buttonClasses } from '../../../components/ui/button';
import { PageHeader } from '../../../components/ui/page-header';
import { ErrorState, LoadingState } from '../../../components/ui/states';
import { useProduct } from '../../../api/products/get-product';
import { DocumentsSection } from './documents-section';
import { DryingPreview } from './drying-preview';
import { LotsSection } from './lots-section';
import { ProductForm } from './product-form';
import { productKindLabels } from './product-format';
import { ProductSummary } from './product-summary';

interface ProductPageProps {
  id: number;
  units: UnitSystem;
  timeZone: string;
  planningTempC: number;
  canWrite: boolean;
}

const backLink = (
  <Link to="/data-sheets" className={buttonClasses('secondary')}>
    All data sheets
  </Link>
);

/** One data sheet: the form (or, for those who only read, the sheet itself), a drying preview, lots and PDFs. */
export function ProductPage({ id, units, timeZone, planningTempC, canWrite }: ProductPageProps) {
  const product = useProduct(id);
  if (product.isPending) return <LoadingState what="the data sheet" />;
  if (product.isError) return <ErrorState error={product.error} what="this data sheet" onRetry={() => product.refetch()} />;
  const p = product.data;

  return (
    <>
      <PageHeader
        title={p.name}
        description={[p.makerRef, productKindLabels[p.kind], chemistryLabels[p.chemistry]].filter(Boolean).join(' · ')}
        actions={backLink}
      />
      <div className="space-y-6">
        {/* The short panels first: what a sprayer looks up most, and what a lead adds most often. */}
        <div className="grid items-start gap-6 md:grid-cols-2 xl:grid-cols-3">
          <DryingPreview key={planningTempC} product={p} units={units} startTempC={planningTempC} />
          <LotsSection product={p} canWrite={canWrite} />
          <DocumentsSection product={p} canWrite={canWrite} timeZone={timeZone} />
        </div>
        {canWrite ? (
          <section aria-labelledby="edit-heading">
            <h2 id="edit-heading" className="mb-3 text-xl font-semibold">
              Data sheet
            </h2>
            <ProductForm key={p.id} product={p} />
          </section>
        ) : (
          <ProductSummary product={p} units={units} />
        )}
      </div>
    </>
  );
}
