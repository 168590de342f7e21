import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { buttonClasses } from '../../../components/ui/button';
import { inputClasses } from '../../../components/ui/field';
import { PageHeader } from '../../../components/ui/page-header';
import { Pagination } from '../../../components/ui/pagination';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { useProducts } from '../../../api/products/get-products';
import { ProductsTable, type ProductSort } from './products-table';
import { useDebouncedValue } from './use-debounced-value';

const pageSize = 25;

interface DataSheetsPageProps {
  units: UnitSystem;
  timeZone: string;
  canWrite: boolean;
}

function SearchBox({ value, onChange }: { value: string; onChange: (text: string) => void }) {
  return (
    <div role="search" className="mb-4 max-w-md">
      <label htmlFor="data-sheet-search" className="mb-1 block font-medium">
        Search by name or maker’s reference
      </label>
      <input id="data-sheet-search" type="search" className={inputClasses} value={value} onChange={(event) => onChange(event.target.value)} autoComplete="off" />
    </div>
  );
}

export function DataSheetsPage({ units, timeZone, canWrite }: DataSheetsPageProps) {
  const [search, setSearch] = useState('');
  const [sort, setSort] = useState<ProductSort>({ sort: 'name', dir: 'asc' });
  const [page, setPage] = useState(1);
  const q = useDebouncedValue(search.trim(), 300);
  const products = useProducts({ q: q || undefined, ...sort, page, pageSize });

  // A new search or sort starts again at the first page, or it could land past the end.
  const changeSearch = (text: string) => {
    setSearch(text);
    setPage(1);
  };
  const changeSort = (next: ProductSort) => {
    setSort(next);
    setPage(1);
  };

  return (
    <>
      <PageHeader
        title="Data sheets"
        description="Each coating with the figures from its maker’s data sheet: drying times, mix, limits and hazards, with the lots in stock and the PDF sheets."
        actions={
          canWrite && (
            <Link to="/data-sheets/new" className={buttonClasses('primary')}>
              Add data sheet
            </Link>
          )
        }
      />
      <SearchBox value={search} onChange={changeSearch} />
      {products.isPending ? (
        <LoadingState what="data sheets" />
      ) : products.isError ? (
        <ErrorState error={products.error} what="the data sheets" onRetry={() => products.refetch()} />
      ) : products.data.items.length === 0 ? (
        <EmptyState title={q ? `No data sheet matches “${q}”` : 'No data sheets yet'}>
          {q ? 'Try part of the name or the maker’s reference.' : canWrite ? 'Add the first product from its maker’s data sheet.' : 'The finishing lead or the owner adds data sheets.'}
        </EmptyState>
      ) : (
        <div aria-busy={products.isFetching} className={products.isPlaceholderData ? 'opacity-70' : undefined}>
          <ProductsTable products={products.data.items} units={units} timeZone={timeZone} sort={sort} onSort={changeSort} />
          <Pagination page={page} pageSize={pageSize} total={products.data.total} noun="data sheets" onPage={setPage} />
        </div>
      )}
    </>
  );
}
