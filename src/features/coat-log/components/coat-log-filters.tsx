import { useId } from 'react';
import { useJobs } from '../../../api/jobs/get-jobs';
import { useProducts } from '../../../api/products/get-products';
import { inputClasses } from '../../../components/ui/field';

const filterChoices = { page: 1, pageSize: 200 };

export interface CoatLogFilterValues {
  jobId?: number;
  productId?: number;
  from: string;
  to: string;
  history: boolean;
}

interface CoatLogFiltersProps {
  value: CoatLogFilterValues;
  onChange: (next: CoatLogFilterValues) => void;
}

function Labelled({ label, children }: { label: string; children: (id: string) => React.ReactNode }) {
  const id = useId();
  return (
    <div>
      <label htmlFor={id} className="mb-1 block font-medium">
        {label}
      </label>
      {children(id)}
    </div>
  );
}

const toId = (text: string) => (text ? Number(text) : undefined);

export function CoatLogFilters({ value, onChange }: CoatLogFiltersProps) {
  // The choices: the latest 200 jobs, and the data sheets by name.
  const jobs = useJobs(filterChoices);
  const products = useProducts(filterChoices);
  const set = (patch: Partial<CoatLogFilterValues>) => onChange({ ...value, ...patch });
  return (
    <form role="search" aria-label="Filter the coat log" onSubmit={(e) => e.preventDefault()} className="mb-4 grid gap-3 rounded-panel border border-maple-300 bg-white p-4 sm:grid-cols-2 xl:grid-cols-5">
      <Labelled label="Job">
        {(id) => (
          <select id={id} className={inputClasses} value={value.jobId ?? ''} onChange={(e) => set({ jobId: toId(e.target.value) })}>
            <option value="">All jobs</option>
            {(jobs.data?.items ?? []).map((job) => (
              <option key={job.id} value={job.id}>
                {job.reference} · {job.customer}
              </option>
            ))}
          </select>
        )}
      </Labelled>
      <Labelled label="Product">
        {(id) => (
          <select id={id} className={inputClasses} value={value.productId ?? ''} onChange={(e) => set({ productId: toId(e.target.value) })}>
            <option value="">All products</option>
            {(products.data?.items ?? []).map((product) => (
              <option key={product.id} value={product.id}>
                {product.name}
              </option>
            ))}
          </select>
        )}
      </Labelled>
      <Labelled label="Sprayed from (shop date)">{(id) => <input id={id} type="date" className={inputClasses} value={value.from} onChange={(e) => set({ from: e.target.value })} />}</Labelled>
      <Labelled label="Sprayed to (shop date)">{(id) => <input id={id} type="date" className={inputClasses} value={value.to} onChange={(e) => set({ to: e.target.value })} />}</Labelled>
      <label className="flex min-h-touch cursor-pointer items-center gap-3 self-end rounded-panel border-2 border-maple-400 px-3 py-2 has-[:focus-visible]:outline has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-lacquer-500">
        <input type="checkbox" className="size-6 accent-lacquer-700" checked={value.history} onChange={(e) => set({ history: e.target.checked })} />
        <span className="font-semibold">Show history</span>
      </label>
    </form>
  );
}
