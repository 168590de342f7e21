import type { ChecklistResult } from '../../../../shared/schemas/checklist';
import { shopWhen } from '../utils/session-format';
import { ChecklistNotes, checklistVerdictWords } from './checklist-verdict';
import { VerdictBadge } from './verdict-badge';

/** What was recorded on the server: its verdict is the one that counts. Checks still on the tablet say so. */
export function RecordedChecklist({ checklist, waiting = false, timeZone }: { checklist: ChecklistResult; waiting?: boolean; timeZone: string }) {
  return (
    <div className="rounded-panel border border-maple-300 bg-white p-3">
      {waiting && (
        <p className="mb-2 font-bold text-verdict-caution">
          Waiting to send: these checks are kept on this tablet. The verdict below is the tablet’s own; the server’s comes when they are sent.
        </p>
      )}
      <p className="flex flex-wrap items-center gap-3">
        <span className="font-semibold">
          Checks recorded {shopWhen(checklist.completedAt, timeZone)} by {checklist.completedByName}
        </span>
        <VerdictBadge verdict={checklist.verdict} label={checklistVerdictWords[checklist.verdict]} />
      </p>
      {checklist.problems.length > 0 && (
        <ul className="mt-2 list-disc pl-6">
          {checklist.problems.map((problem) => (
            <li key={problem}>{problem}</li>
          ))}
        </ul>
      )}
      <ChecklistNotes notes={checklist.notes} />
      {checklist.overrideReason && (
        <p className="mt-2">
          <span className="font-semibold">Lead’s override:</span> {checklist.overrideReason}
        </p>
      )}
    </div>
  );
}
