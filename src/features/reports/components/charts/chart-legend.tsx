type LegendMark = 'bar' | 'pale-bar' | 'line' | 'dashed-line' | 'point';

interface LegendEntry {
  label: string;
  colour: string;
  mark: LegendMark;
}

function Mark({ mark, colour }: { mark: LegendMark; colour: string }) {
  return (
    <svg width="18" height="12" viewBox="0 0 18 12" aria-hidden="true" className="shrink-0">
      {mark === 'bar' && <rect x="2" y="1" width="14" height="10" fill={colour} />}
      {mark === 'pale-bar' && <rect x="2.5" y="1.5" width="13" height="9" fill={colour} fillOpacity={0.35} stroke={colour} />}
      {mark === 'line' && <line x1="1" y1="6" x2="17" y2="6" stroke={colour} strokeWidth={2.5} />}
      {mark === 'dashed-line' && <line x1="1" y1="6" x2="17" y2="6" stroke={colour} strokeWidth={2.5} strokeDasharray="5 2" />}
      {mark === 'point' && <polygon points="9,1 14,6 9,11 4,6" fill={colour} />}
    </svg>
  );
}

/**
 * The key under a chart, as ordinary text that wraps to any width: the chart library's own legend
 * is placed from a measurement taken on screen, and lands on the axis when a page is printed.
 */
export function ChartLegend({ entries }: { entries: LegendEntry[] }) {
  return (
    <ul className="mt-2 flex flex-wrap justify-center gap-x-4 gap-y-1 text-sm text-maple-900">
      {entries.map((entry) => (
        <li key={entry.label} className="flex items-center gap-1.5">
          <Mark mark={entry.mark} colour={entry.colour} />
          {entry.label}
        </li>
      ))}
    </ul>
  );
}
