import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Product } from '../../../../shared/schemas/product';
import type { CoatPreview } from '../hooks/use-coat-preview';
import { shopWhen } from '../utils/session-format';
import type { CoatStep } from '../utils/session-plan';
import { CoatWarnings } from './coat-warnings';
import { FilmReadout } from './film-readout';

interface CoatPreviewPanelProps {
  preview: CoatPreview;
  product: Product | undefined;
  step: CoatStep | undefined;
  thinningPct: number;
  units: UnitSystem;
  timeZone: string;
  reason: string;
  reasonError: string | null;
  onReason: (reason: string) => void;
}

export function CoatPreviewPanel({ preview, product, step, thinningPct, units, timeZone, reason, reasonError, onReason }: CoatPreviewPanelProps) {
  if (preview.problem || !preview.record || !product) return <p className="rounded-panel border border-dashed border-maple-400 bg-white p-3 text-lg text-maple-800">{preview.problem}</p>;
  const { record } = preview;
  return (
    <section aria-label="What this coat will record" className="space-y-3">
      <FilmReadout product={product} targetDryUm={step?.dryFilmUm ?? null} dryFilmUm={record.dryFilmUm} thinningPct={thinningPct} units={units} />
      <p className="text-maple-800">
        If sprayed now: flash-off until {shopWhen(record.flashOffEndsAt.toISOString(), timeZone)}, recoat from {shopWhen(record.recoatOpensAt.toISOString(), timeZone)}, handle from{' '}
        {shopWhen(record.handleAt.toISOString(), timeZone)}.
      </p>
      <CoatWarnings warnings={preview.warnings} reason={reason} error={reasonError} onReason={onReason} />
    </section>
  );
}
