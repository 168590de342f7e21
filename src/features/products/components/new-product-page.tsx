import { Link, useNavigate } from 'react-router-dom';
import { buttonClasses } from '../../../components/ui/button';
import { PageHeader } from '../../../components/ui/page-header';
import { ProductForm } from './product-form';

/** Lots and PDFs need a saved product, so after saving the lead lands on its page to add them. */
export function NewProductPage() {
  const navigate = useNavigate();
  return (
    <>
      <PageHeader
        title="New data sheet"
        description="Copy the figures from the maker’s technical data sheet. Lots and the PDF sheets are added once it is saved."
        actions={
          <Link to="/data-sheets" className={buttonClasses('secondary')}>
            All data sheets
          </Link>
        }
      />
      <ProductForm onSaved={(product) => navigate(`/data-sheets/${product.id}`)} onCancel={() => navigate('/data-sheets')} />
    </>
  );
}
