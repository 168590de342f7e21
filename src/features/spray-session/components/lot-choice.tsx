import type { Lot } from '../../../../shared/schemas/product';

interface LotChoiceProps {
  lots: Lot[];
  value: number[];
  onChange: (lotIds: number[]) => void;
}

/** The lots of the product in stock; an expired one can still be ticked, but says so loudly. */
export function LotChoice({ lots, value, onChange }: LotChoiceProps) {
  if (lots.length === 0) return <p className="text-maple-700">No lots are recorded for this product. Ask the lead to add the tin’s lot number to its data sheet.</p>;
  const toggle = (id: number) => onChange(value.includes(id) ? value.filter((v) => v !== id) : [...value, id]);
  const expiredChosen = lots.some((lot) => lot.expired && value.includes(lot.id));
  return (
    <fieldset>
      <legend className="mb-1 font-medium">Lots used</legend>
      <div className="flex flex-wrap gap-2">
        {lots.map((lot) => (
          <label
            key={lot.id}
            className={`flex min-h-touch cursor-pointer items-center gap-2 rounded-panel border-2 px-3 py-2 has-[:focus-visible]:outline has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-lacquer-500 ${lot.expired ? 'border-verdict-stop' : 'border-maple-400'} bg-white`}
          >
            <input type="checkbox" className="size-6 accent-lacquer-700" checked={value.includes(lot.id)} onChange={() => toggle(lot.id)} />
            <span className="font-mono font-semibold">{lot.lotNumber}</span>
            {lot.expired ? (
              <span className="font-bold text-verdict-stop">Expired {lot.expiresOn}</span>
            ) : (
              lot.expiresOn && <span className="text-sm text-maple-700">use by {lot.expiresOn}</span>
            )}
          </label>
        ))}
      </div>
      {expiredChosen && (
        <p role="alert" className="mt-2 font-medium text-verdict-stop">
          <span aria-hidden="true">⚠ </span>An expired lot is chosen. Check it with the lead before mixing; a coat from it needs a reason on its record.
        </p>
      )}
    </fieldset>
  );
}
