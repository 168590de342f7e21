import type { BoothUpkeep } from '../../../../shared/schemas/upkeep';
import { formatShopDateTime } from '../../../lib/shop-time';
import { dayWords, pascals, speed } from './upkeep-format';

interface Entry {
  key: string;
  when: string;
  sortKey: string;
  what: string;
  who: string;
}

/** One list, newest first, of everything recorded on the booth lately: the evidence beside the coat log. */
function entriesOf(upkeep: BoothUpkeep, timeZone: string): Entry[] {
  const bankName = (id: number) => upkeep.banks.find((b) => b.id === id)?.name ?? `Bank ${id}`;
  const { readings, changes, extractionTests, fireInspections } = upkeep.history;
  return [
    ...readings.map((r) => ({ key: `r${r.id}`, sortKey: r.at, when: formatShopDateTime(r.at, timeZone), what: `${bankName(r.filterBankId)}: gauge ${pascals(r.pressureDropPa)}`, who: r.source === 'sensor' ? 'Booth sensor' : r.recordedByName })),
    ...changes.map((c) => ({ key: `c${c.id}`, sortKey: c.changedAt, when: formatShopDateTime(c.changedAt, timeZone), what: `${bankName(c.filterBankId)}: filters changed (${pascals(c.beforePa)} → ${pascals(c.afterPa)})${c.notes ? `. ${c.notes}` : ''}`, who: c.changedByName })),
    ...extractionTests.map((t) => ({ key: `e${t.id}`, sortKey: `${t.testedOn}T99`, when: dayWords(t.testedOn), what: `Extraction test: mean ${speed(t.meanFaceVelocityMps)}${t.clearanceMin === null ? '' : `, clearance ${t.clearanceMin} min`}, by ${t.testedBy}`, who: t.recordedByName })),
    ...fireInspections.map((f) => ({ key: `f${f.id}`, sortKey: `${f.inspectedOn}T99`, when: dayWords(f.inspectedOn), what: `Fire-protection inspection by ${f.inspectedBy}: ${f.passed ? 'passed' : 'faults found'}`, who: f.recordedByName })),
  ].sort((a, b) => b.sortKey.localeCompare(a.sortKey));
}

export function UpkeepHistory({ upkeep, timeZone }: { upkeep: BoothUpkeep; timeZone: string }) {
  const entries = entriesOf(upkeep, timeZone);
  return (
    <section aria-labelledby="upkeep-history" className="rounded-panel border border-maple-300 bg-white p-4">
      <h3 id="upkeep-history" className="text-lg font-semibold">
        Recent record
      </h3>
      {entries.length === 0 ? (
        <p className="mt-1 text-maple-800">Nothing recorded on this booth yet.</p>
      ) : (
        <ul className="mt-2 divide-y divide-maple-200">
          {entries.map((entry) => (
            <li key={entry.key} className="flex flex-wrap gap-x-3 py-2">
              <span className="min-w-36 font-medium">{entry.when}</span>
              <span className="flex-1">{entry.what}</span>
              <span className="text-maple-700">{entry.who}</span>
            </li>
          ))}
        </ul>
      )}
      <p className="mt-2 text-sm text-maple-700">Records are never changed or deleted; a later one supersedes an earlier.</p>
    </section>
  );
}
