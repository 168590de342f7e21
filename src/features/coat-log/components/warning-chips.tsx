import { useId, useState } from 'react';
import type { Coat } from '../../../../shared/schemas/coat';
import { warningShortWord } from '../../../../shared/words';
import { sharedReason } from './coat-log-format';

interface WarningChipsProps {
  coat: Coat;
  /** Cards on a tablet get full 44 px chips for gloved hands; the wide table packs them a little tighter. */
  size: 'table' | 'touch';
}

const chipSize = { table: 'min-h-7 px-1.5 text-xs', touch: 'min-h-touch px-3' };

/**
 * Each warning as a short chip; the chip opens the full warning and any reason given (a disclosure:
 * click, tap, Enter or Space), so a page of warned coats stays a page long.
 */
export function WarningChips({ coat, size }: WarningChipsProps) {
  const [open, setOpen] = useState<string | null>(null);
  const id = useId();
  if (coat.warnings.length === 0) return <span className="text-maple-700">None</span>;
  const shared = sharedReason(coat);
  const shown = coat.warnings.find((w) => w.code === open);
  return (
    <div className="min-w-60">
      <ul aria-label="Warnings" className="flex flex-wrap gap-1">
        {coat.warnings.map((w) => (
          <li key={w.code}>
            <button
              type="button"
              aria-expanded={open === w.code}
              aria-controls={`${id}-text`}
              onClick={() => setOpen(open === w.code ? null : w.code)}
              className={`inline-flex items-center gap-1 rounded-full border border-verdict-caution font-semibold text-verdict-caution focus-visible:outline-3 focus-visible:outline-lacquer-600 ${open === w.code ? 'bg-verdict-caution text-white' : 'bg-white hover:bg-maple-100'} ${chipSize[size]}`}
            >
              <span aria-hidden="true">⚠</span>
              {warningShortWord(w.code)}
              {w.acknowledgedReason && <span className="sr-only"> (reason given)</span>}
            </button>
          </li>
        ))}
      </ul>
      <div id={`${id}-text`}>
        {shown && (
          <p className="mt-1 max-w-80 text-sm">
            {shown.message}
            {(shown.acknowledgedReason || shared) && <span className="block font-medium text-maple-800">Reason: {shared ?? shown.acknowledgedReason}</span>}
          </p>
        )}
      </div>
    </div>
  );
}
