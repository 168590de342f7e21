import { useRef, type KeyboardEvent } from 'react';
import { reportKinds, type ReportKind } from '../../../api/reports/report-keys';
import { reportCatalogue } from '../utils/report-catalogue';

export const reportPanelId = 'report-panel';
export const reportTabId = (kind: ReportKind) => `report-tab-${kind}`;

const moves: Record<string, (index: number) => number> = {
  ArrowRight: (i) => (i + 1) % reportKinds.length,
  ArrowDown: (i) => (i + 1) % reportKinds.length,
  ArrowLeft: (i) => (i - 1 + reportKinds.length) % reportKinds.length,
  ArrowUp: (i) => (i - 1 + reportKinds.length) % reportKinds.length,
  Home: () => 0,
  End: () => reportKinds.length - 1,
};

/** Tabs, one per report: arrow keys, Home and End move between them (and open the one reached). */
export function ReportPicker({ value, onChange }: { value: ReportKind; onChange: (kind: ReportKind) => void }) {
  const tabs = useRef(new Map<ReportKind, HTMLButtonElement>());
  const onKeyDown = (event: KeyboardEvent<HTMLButtonElement>, index: number) => {
    const move = moves[event.key];
    if (!move) return;
    event.preventDefault();
    const next = reportKinds[move(index)];
    onChange(next);
    tabs.current.get(next)?.focus();
  };
  return (
    <div role="tablist" aria-label="Report" className="flex flex-wrap gap-2">
      {reportKinds.map((kind, index) => {
        const selected = kind === value;
        return (
          <button
            key={kind}
            ref={(element) => {
              if (element) tabs.current.set(kind, element);
              else tabs.current.delete(kind);
            }}
            type="button"
            role="tab"
            id={reportTabId(kind)}
            aria-selected={selected}
            aria-controls={reportPanelId}
            tabIndex={selected ? 0 : -1}
            onClick={() => onChange(kind)}
            onKeyDown={(event) => onKeyDown(event, index)}
            className={`min-h-touch rounded-panel border-2 px-4 font-semibold ${selected ? 'border-lacquer-800 bg-lacquer-800 text-white' : 'border-maple-400 bg-white text-maple-900 hover:bg-maple-100'}`}
          >
            {reportCatalogue[kind].tab}
          </button>
        );
      })}
    </div>
  );
}
