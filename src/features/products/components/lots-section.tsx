import type { Product } from '../../../../shared/schemas/product';
import { AddLotForm } from './add-lot-form';
import { ExpiredBadge } from './product-cells';

function formatDay(isoDate: string): string {
  // A calendar date with no time: read it as noon UTC so no timezone can move it to another day.
  return new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' }).format(new Date(`${isoDate}T12:00:00Z`));
}

export function LotsSection({ product, canWrite }: { product: Product; canWrite: boolean }) {
  return (
    <section aria-labelledby="lots-heading" className="rounded-panel border border-maple-300 bg-white p-4">
      <h2 id="lots-heading" className="text-lg font-semibold">
        Lots
      </h2>
      <p className="mb-3 text-sm text-maple-700">The batches in stock; coat records name the lot used.</p>
      {product.lots.length === 0 ? (
        <p className="text-maple-700">No lots recorded yet.</p>
      ) : (
        <table className="w-full border-collapse text-left">
          <caption className="sr-only">Lots of {product.name}</caption>
          <thead className="text-sm">
            <tr className="border-b border-maple-300">
              <th scope="col" className="py-1 pr-3 font-semibold">
                Lot number
              </th>
              <th scope="col" className="py-1 pr-3 font-semibold">
                Expires
              </th>
              <th scope="col" className="py-1 font-semibold">
                Status
              </th>
            </tr>
          </thead>
          <tbody>
            {product.lots.map((lot) => (
              <tr key={lot.id} className="border-b border-maple-200 last:border-b-0">
                <th scope="row" className="py-2 pr-3 font-semibold">
                  {lot.lotNumber}
                </th>
                <td className="py-2 pr-3">{lot.expiresOn ? formatDay(lot.expiresOn) : '—'}</td>
                <td className="py-2">{lot.expired ? <ExpiredBadge /> : lot.expiresOn ? <span className="text-verdict-go">In date</span> : 'No expiry date'}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {canWrite && <AddLotForm productId={product.id} />}
    </section>
  );
}
