import type { FitnessFindingDto } from '../../../shared/schemas/upkeep';
import { StatusBadge } from '../ui/status-badge';

interface FitnessFindingsProps {
  verdict: 'go' | 'caution' | 'stop';
  findings: FitnessFindingDto[];
  /** False when the viewer may not see the assigned sprayer's records. */
  crewShown: boolean;
  deferLine: string;
  headingLevel?: 'h2' | 'h3';
}

const verdictWords = { go: 'Fit to spray', caution: 'Fit to spray, with cautions', stop: 'Not fit to spray' } as const;

/** What keeps a booth or a sprayer from being fit to spray, each with the rule it comes from. */
export function FitnessFindings({ verdict, findings, crewShown, deferLine, headingLevel = 'h3' }: FitnessFindingsProps) {
  const Heading = headingLevel;
  return (
    <section aria-label="Fit to spray" className={`rounded-panel border-2 bg-white p-3 ${verdict === 'stop' ? 'border-verdict-stop' : verdict === 'caution' ? 'border-verdict-caution' : 'border-verdict-go'}`}>
      <div className="flex flex-wrap items-center gap-2">
        <Heading className="font-semibold">Booth upkeep and sprayer’s records</Heading>
        <StatusBadge tone={verdict === 'go' ? 'go' : verdict}>{verdictWords[verdict]}</StatusBadge>
      </div>
      {findings.length === 0 ? (
        <p className="mt-1 text-maple-800">Filters within their limits, extraction test and fire inspection in date{crewShown ? ', and the sprayer’s fit test and health surveillance in date' : ''}.</p>
      ) : (
        <ul className="mt-2 space-y-2">
          {findings.map((finding) => (
            <li key={`${finding.code}-${finding.message}`}>
              <p className={`font-medium ${finding.severity === 'stop' ? 'text-verdict-stop' : 'text-verdict-caution'}`}>
                <span aria-hidden="true">{finding.severity === 'stop' ? '✕ ' : '! '}</span>
                <span className="sr-only">{finding.severity === 'stop' ? 'Stop: ' : 'Caution: '}</span>
                {finding.message}
              </p>
              <p className="text-sm text-maple-700">{finding.rule}</p>
            </li>
          ))}
        </ul>
      )}
      {!crewShown && <p className="mt-2 text-sm text-maple-700">The assigned sprayer’s own records are shown to them, a lead and the owner.</p>}
      <p className="mt-2 border-t border-maple-200 pt-2 text-sm text-maple-800">{deferLine}</p>
    </section>
  );
}
