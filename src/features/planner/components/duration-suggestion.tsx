import { sessionMinutes } from '../../../../shared/finishing/planning';
import type { Booth } from '../../../../shared/schemas/booth';
import { Button } from '../../../components/ui/button';
import { formatMinutes } from '../../../lib/durations';
import { formatShopClock } from '../../../lib/shop-time';
import { formatNumber } from '../../../lib/units-display';

interface DurationSuggestionProps {
  areaM2: number;
  booth: Booth | undefined;
  setupMin: number;
  cleanDownMin: number;
  start: string;
  timeZone: string;
  onUseEnd: (end: string) => void;
}

/** The session length the parts call for (shared/finishing/planning.ts), offered, not forced. */
export function DurationSuggestion({ areaM2, booth, setupMin, cleanDownMin, start, timeZone, onUseEnd }: DurationSuggestionProps) {
  if (!booth || areaM2 <= 0) return null;
  const minutes = sessionMinutes({ areaM2, sprayRateM2PerH: booth.sprayRateM2PerH, setupMin, cleanDownMin });
  const startMs = Date.parse(start);
  const end = Number.isNaN(startMs) ? null : new Date(startMs + minutes * 60_000);
  return (
    <div className="rounded-panel border border-lacquer-200 bg-lacquer-50 p-3 sm:col-span-2" aria-live="polite">
      <p>
        Suggested length <strong>{formatMinutes(minutes)}</strong>: {formatNumber(areaM2, 2)} m² at {formatNumber(booth.sprayRateM2PerH)} m²/h in {booth.name}, plus{' '}
        {setupMin} min set-up and {cleanDownMin} min clean-down.
      </p>
      {end && (
        <Button variant="secondary" className="mt-2" onClick={() => onUseEnd(end.toISOString())}>
          End at {formatShopClock(end, timeZone)}
        </Button>
      )}
    </div>
  );
}
