import { Suspense, type ReactNode } from 'react';

export const chartHeight = 320;

/**
 * On paper the charts redraw at the page's width (see useChartSize); should a browser print
 * without saying so first, the screen-sized drawing scales down to the page instead of running off it.
 */
const printChart = [
  'print:[&_.recharts-wrapper]:!w-full',
  'print:[&_svg.recharts-surface]:h-auto print:[&_svg.recharts-surface]:max-w-full',
  'print:[&_.recharts-tooltip-wrapper]:hidden',
].join(' ');

function ChartPlaceholder() {
  return (
    <div style={{ height: chartHeight }} className="flex items-center justify-center rounded-panel bg-maple-50 text-maple-700">
      Drawing the chart…
    </div>
  );
}

/**
 * The chart is a picture for sighted readers; the table beside it carries the same figures for
 * everyone else, so the chart is one labelled image and its inner parts are not read out.
 */
export function ChartFrame({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className={`min-w-0 rounded-panel border border-maple-300 bg-white p-3 print:break-inside-avoid print:border-0 print:p-0 ${printChart}`}>
      <div role="img" aria-label={label}>
        <Suspense fallback={<ChartPlaceholder />}>{children}</Suspense>
      </div>
    </div>
  );
}
