import type { UnitSystem } from '../../../../shared/schemas/common';
import type { PartHistory, PartHistoryEntry } from '../../../../shared/schemas/part-history';
import { formatQuantity } from '../../../../shared/units';
import { ErrorState, LoadingState } from '../../../components/ui/states';
import { formatShopDateTime } from '../../../lib/shop-time';
import { useNow } from '../../../lib/use-now';
import { usePartHistory } from '../../../api/parts/get-part-history';
import { coatAtStepWords, coatOfWords, denibWords, upperFirst } from '../../../../shared/words';
import { partNowLines, stepStatuses, type StepStatus } from './part-now-words';

interface Props {
  units: UnitSystem;
  timeZone: string;
}

/** "Coat 2 of 3: Topcoat, 40 µm dry" or "Denib with P320": the finish system's steps in the booth's words. */
function stepName(status: StepStatus, statuses: StepStatus[], units: UnitSystem): string {
  const { step } = status;
  if (step.kind !== 'coat') return upperFirst(denibWords(step.grit));
  const coats = statuses.filter((s) => s.step.kind === 'coat');
  return `${upperFirst(coatOfWords(coats.indexOf(status) + 1, coats.length))}: ${step.productName}, ${formatQuantity(step.dryFilmUm, 'filmThickness', units)} dry`;
}

function stepDone(status: StepStatus, timeZone: string): string {
  if (status.done === 'no-record') return 'Done (no denib recorded; the next coat is on)';
  if (status.done) return `Done ${formatShopDateTime(status.done.at, timeZone)} by ${status.done.recordedByName}`;
  return status.next ? 'Next' : 'To do';
}

function Steps({ history, units, timeZone }: { history: PartHistory } & Props) {
  if (history.steps.length === 0) return null;
  const statuses = stepStatuses(history);
  return (
    <section aria-labelledby="part-steps-heading">
      <h2 id="part-steps-heading" className="mb-2 text-xl font-bold text-lacquer-900">
        Finish system
      </h2>
      <ol className="space-y-2">
        {statuses.map((status) => (
          <li key={status.step.position} className={`rounded-panel border bg-white p-3 ${status.next ? 'border-2 border-lacquer-700' : 'border-maple-300'}`}>
            <p className="font-semibold">{stepName(status, statuses, units)}</p>
            <p className={status.done ? 'text-verdict-go' : status.next ? 'font-semibold text-lacquer-800' : 'text-maple-700'}>
              {status.done && <span aria-hidden="true">✓ </span>}
              {stepDone(status, timeZone)}
            </p>
          </li>
        ))}
      </ol>
    </section>
  );
}

function entryWords(entry: PartHistoryEntry, steps: PartHistory['steps'], units: UnitSystem, timeZone: string): { what: string; more: string } {
  if (entry.kind === 'denib') return { what: upperFirst(denibWords(entry.grit)), more: entry.notes };
  const step = (entry.stepPosition === null ? null : coatAtStepWords(steps, entry.stepPosition)) ?? 'outside the finish system';
  const film = entry.dryFilmUm === null ? '' : `, ${formatQuantity(entry.dryFilmUm, 'filmThickness', units)} dry`;
  const rework = entry.rework ? ' (sprayed again)' : '';
  // Between coats a coat's own handle time is not "ready": the Now panel says when the part is. Its recoat time is what follows it.
  const window = entry.recoatClosesAt ? `recoat ${formatShopDateTime(entry.recoatOpensAt, timeZone)} to ${formatShopDateTime(entry.recoatClosesAt, timeZone)}` : `recoat from ${formatShopDateTime(entry.recoatOpensAt, timeZone)}`;
  return { what: `Coat: ${entry.productName}, ${step}${film}${rework}`, more: window };
}

function Entries({ history, units, timeZone }: { history: PartHistory } & Props) {
  return (
    <section aria-labelledby="part-log-heading">
      <h2 id="part-log-heading" className="mb-2 text-xl font-bold text-lacquer-900">
        Coats and denibs
      </h2>
      {history.entries.length === 0 ? (
        <p className="rounded-panel border border-dashed border-maple-400 bg-white p-4 text-maple-800">Nothing sprayed or sanded on this part yet.</p>
      ) : (
        <ol aria-label="Coats and denibs, oldest first" className="space-y-2">
          {history.entries.map((entry) => {
            const { what, more } = entryWords(entry, history.steps, units, timeZone);
            return (
              <li key={`${entry.kind}-${entry.id}`} className={`rounded-panel border bg-white p-3 ${entry.kind === 'denib' ? 'border-dashed border-maple-500' : 'border-maple-300'}`}>
                <p className="font-semibold">{what}</p>
                <p className="text-sm text-maple-800">
                  {formatShopDateTime(entry.at, timeZone)} · by {entry.recordedByName}
                  {more && ` · ${more}`}
                </p>
              </li>
            );
          })}
        </ol>
      )}
    </section>
  );
}

/** Where the part stands: its next step and when it can be handled and packed, first thing on the page a tag opens. */
export function PartNow({ partId, units, timeZone }: Props & { partId: number }) {
  const history = usePartHistory(partId);
  const now = useNow(30_000);
  if (history.isPending) return <LoadingState what="where the part stands" />;
  if (history.isError) return <ErrorState error={history.error} what="where the part stands" onRetry={() => history.refetch()} />;
  const { headline, details } = partNowLines(history.data, now, timeZone, units);
  return (
    <section aria-labelledby="part-now-heading" className="mb-6 rounded-panel border-2 border-lacquer-700 bg-white p-4">
      <h2 id="part-now-heading" className="text-sm font-semibold uppercase tracking-wide text-lacquer-800">
        Now
      </h2>
      <p className="mt-1 text-2xl font-bold text-lacquer-900">{headline}</p>
      {details.map((line) => (
        <p key={line} className="mt-1 text-lg text-maple-900">
          {line}
        </p>
      ))}
    </section>
  );
}

/** The part's finish system step by step and every coat and denib it had: for every role that reads the ready board. */
export function PartHistorySection({ partId, units, timeZone }: Props & { partId: number }) {
  const history = usePartHistory(partId);
  if (history.isPending) return <LoadingState what="the part’s coats" />;
  if (history.isError) return <ErrorState error={history.error} what="the part’s coats" onRetry={() => history.refetch()} />;
  return (
    <div className="mt-6 grid gap-6 lg:grid-cols-2">
      <Steps history={history.data} units={units} timeZone={timeZone} />
      <Entries history={history.data} units={units} timeZone={timeZone} />
    </div>
  );
}
