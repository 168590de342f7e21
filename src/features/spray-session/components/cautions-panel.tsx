import { deferToSdsLine, sessionCautions, type Caution } from '../../../../shared/finishing/cautions';
import type { Booth } from '../../../../shared/schemas/booth';
import type { Product } from '../../../../shared/schemas/product';

/** With no products known the respirator line would read as the mildest level: that is a gap, and it says so. */
function cautionsFor(products: Product[], booth: Booth): Caution[] {
  const cautions = sessionCautions(products, booth);
  if (products.length > 0) return cautions;
  return cautions.map((caution) =>
    caution.code.startsWith('respirator-')
      ? { ...caution, message: 'Not worked out: the products of this session are not known. Read each product’s safety data sheet before spraying.' }
      : caution,
  );
}

interface CautionsPanelProps {
  products: Product[];
  booth: Booth;
  gaps: string[];
  pending: boolean;
}

export function CautionsPanel({ products, booth, gaps, pending }: CautionsPanelProps) {
  return (
    <section aria-labelledby="cautions-heading" className="rounded-panel border-4 border-verdict-caution bg-white p-4">
      <h2 id="cautions-heading" className="text-xl font-bold text-verdict-caution">
        <span aria-hidden="true">⚠ </span>Safety cautions
      </h2>
      {products.length > 0 && <p className="mt-1 text-maple-800">For {products.map((p) => p.name).join(', ')}.</p>}
      {gaps.map((gap) => (
        <p key={gap} className="mt-1 font-medium text-verdict-caution">
          {gap}
        </p>
      ))}
      {pending ? (
        <>
          <p role="status" className="mt-2 text-maple-700">
            Working out the cautions from the data sheets…
          </p>
          <p className="mt-3 border-t border-maple-300 pt-3 text-maple-900">{deferToSdsLine}</p>
        </>
      ) : (
        <ul className="mt-3 grid gap-3 md:grid-cols-2 xl:grid-cols-1">
          {cautionsFor(products, booth).map((caution) => (
            <li key={caution.code} className={caution.code === 'defer' ? 'border-t border-maple-300 pt-3 md:col-span-2 xl:col-span-1' : ''}>
              <p className="text-lg font-semibold text-maple-900">{caution.title}</p>
              <p className="text-maple-900">{caution.message}</p>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
