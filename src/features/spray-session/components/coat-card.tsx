import type { Coat } from '../../../../shared/schemas/coat';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { ReadyPart } from '../../../../shared/schemas/ready';
import { formatQuantity } from '../../../../shared/units';
import { coatPlaceWords } from '../../../../shared/words';
import { useNow } from '../../../lib/use-now';
import { nextStepWords, shopWhen } from '../utils/session-format';
import { CoatTimes } from './coat-times';
import { Countdown } from './countdown';

interface CoatCardProps {
  coat: Coat;
  partLabel: (id: number) => string;
  /** Where the coat's first part now stands; shown on the latest coat as its next window. */
  next?: ReadyPart;
  latest: boolean;
  units: UnitSystem;
  timeZone: string;
}

function NextWindow({ part, timeZone, now }: { part: ReadyPart; timeZone: string; now: Date }) {
  if (!part.nextStep) return <p>All coats of the finish system are on {part.label}.</p>;
  const window = part.nextWindowOpensAt
    ? `window opens ${shopWhen(part.nextWindowOpensAt, timeZone, now)}${part.nextWindowClosesAt ? `, closes ${shopWhen(part.nextWindowClosesAt, timeZone, now)}` : ', no closing time'}`
    : 'no window worked out yet';
  return (
    <p>
      <span className="font-semibold">Next on {part.label}:</span> {nextStepWords(part)}; {window}.
    </p>
  );
}

export function CoatCard({ coat, partLabel, next, latest, units, timeZone }: CoatCardProps) {
  const now = useNow();
  const film = (um: number | null) => (um === null ? '—' : formatQuantity(um, 'filmThickness', units));
  const temp = (c: number) => formatQuantity(c, 'temperature', units);
  const flashing = Date.parse(coat.flashOffEndsAt) > now.getTime();
  const parts = coat.partIds.map(partLabel);
  const place = coatPlaceWords(coat);
  const name = [place, coat.jobReference, shopWhen(coat.sprayedAt, timeZone, now)].filter(Boolean).join(', ');
  return (
    <article aria-label={name} className={`rounded-panel border-2 bg-white p-4 ${latest ? 'border-lacquer-700' : 'border-maple-300'}`}>
      <h3 className="text-lg font-bold">
        {latest && <span className="mr-2 rounded-panel bg-lacquer-700 px-2 py-0.5 text-sm text-white">Latest</span>}
        {place} · {shopWhen(coat.sprayedAt, timeZone, now)} · {coat.productName}
      </h3>
      <p className="text-maple-800">
        {parts.length === 1 ? parts[0] : `${parts.length} parts: ${parts.slice(0, 6).join(', ')}${parts.length > 6 ? '…' : ''}`} · by {coat.recordedByName}
      </p>
      <p className="mt-1">
        Wet film {film(coat.wetFilmUm)} → <strong>dry film {film(coat.dryFilmUm)}</strong> · thinning {coat.thinningPct} % · air {temp(coat.airTempC)}, RH {coat.relativeHumidityPct} %, surface {temp(coat.surfaceTempC)}, dew point {temp(coat.dewPointC)}
      </p>
      <p className="mt-2 flex flex-wrap items-center gap-x-3 text-lg font-semibold">
        {flashing ? (
          <>
            <span>Flash-off until {shopWhen(coat.flashOffEndsAt, timeZone, now)}:</span>
            <Countdown label={`${name} flash-off`} until={coat.flashOffEndsAt} now={now} overText="over" />
          </>
        ) : (
          <span>Flash-off over at {shopWhen(coat.flashOffEndsAt, timeZone, now)}</span>
        )}
      </p>
      {latest && (
        <div className="mt-2 space-y-2">
          <CoatTimes coat={coat} timeZone={timeZone} now={now} />
          {next && <NextWindow part={next} timeZone={timeZone} now={now} />}
        </div>
      )}
      {coat.warnings.length > 0 && (
        <ul className="mt-2 space-y-1">
          {coat.warnings.map((warning) => (
            <li key={warning.code}>
              <span className="font-semibold text-verdict-caution">⚠ Warning:</span> {warning.message}
              {warning.acknowledgedReason && <span className="block pl-6 text-maple-800">Reason given: {warning.acknowledgedReason}</span>}
            </li>
          ))}
        </ul>
      )}
    </article>
  );
}
