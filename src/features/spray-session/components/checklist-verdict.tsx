import type { ChecklistEvaluation } from '../../../../shared/finishing/checklist';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { surfaceMarginWords } from '../../../../shared/finishing/conditions';
import { formatQuantity } from '../../../../shared/units';
import { verdictBorder, VerdictBadge } from './verdict-badge';

export const checklistVerdictWords = { go: 'Go: fit to spray', caution: 'Caution: spray with care', stop: 'Stop: do not spray' } as const;
const spokenVerdict = { go: 'Verdict now go, fit to spray.', caution: 'Verdict now caution, spray with care.', stop: 'Verdict now stop, do not spray.' } as const;

interface ChecklistVerdictProps {
  evaluation: ChecklistEvaluation | null;
  missing: string[];
  dew: { dewPointC: number; surfaceMarginC: number } | null;
  units: UnitSystem;
}

/** Readings within their limits but close to them: information for the sprayer, not a problem. */
export function ChecklistNotes({ notes }: { notes: string[] | undefined }) {
  if (!notes?.length) return null;
  return (
    <div className="mt-3 rounded-panel border-2 border-maple-400 bg-maple-50 p-3">
      <p className="font-semibold">For information</p>
      <ul className="list-disc pl-6">
        {notes.map((note) => (
          <li key={note}>{note}</li>
        ))}
      </ul>
    </div>
  );
}

/** The live verdict as the checks are filled in, each problem in words. */
export function ChecklistVerdict({ evaluation, missing, dew, units }: ChecklistVerdictProps) {
  return (
    <section aria-labelledby="verdict-heading" className={`rounded-panel border-4 bg-white p-4 ${evaluation ? verdictBorder[evaluation.verdict] : 'border-maple-400'}`}>
      <h3 id="verdict-heading" className="sr-only">
        Verdict
      </h3>
      {/* Only the verdict itself is announced as it changes, not every figure and line below it. */}
      <p aria-live="polite" className="sr-only">
        {evaluation ? spokenVerdict[evaluation.verdict] : 'The checks are not complete yet.'}
      </p>
      <div className="flex flex-wrap items-center gap-4">
        {evaluation ? (
          <VerdictBadge verdict={evaluation.verdict} label={checklistVerdictWords[evaluation.verdict]} large />
        ) : (
          <span className="rounded-panel border-2 border-maple-500 px-4 py-2 text-xl font-bold text-maple-800">Not complete</span>
        )}
        {dew && (
          <dl className="flex flex-wrap gap-x-6 gap-y-1 text-lg">
            <div>
              <dt className="inline text-maple-700">Dew point </dt>
              <dd className="inline font-bold">{formatQuantity(dew.dewPointC, 'temperature', units)}</dd>
            </div>
            <div>
              <dt className="inline text-maple-700">Surface </dt>
              <dd className="inline font-bold">{surfaceMarginWords(dew.surfaceMarginC, units)}</dd>
            </div>
          </dl>
        )}
      </div>
      {missing.length > 0 && (
        <div className="mt-3">
          <p className="font-semibold">Still to fill in:</p>
          <ul className="list-disc pl-6">
            {missing.map((item) => (
              <li key={item}>{item}</li>
            ))}
          </ul>
        </div>
      )}
      {evaluation && evaluation.problems.length > 0 && (
        <ul className="mt-3 space-y-2">
          {evaluation.problems.map((problem) => (
            <li key={problem} className="text-lg">
              <span aria-hidden="true">• </span>
              {problem}
            </li>
          ))}
        </ul>
      )}
      {evaluation && evaluation.problems.length === 0 && <p className="mt-3 text-lg">Every check passes.</p>}
      {evaluation && <ChecklistNotes notes={evaluation.notes} />}
    </section>
  );
}
