import { Bar, CartesianGrid, ComposedChart, Line, ReferenceLine, Tooltip, XAxis, YAxis } from 'recharts';
import { monthWords } from '../../utils/report-range';
import type { ChartRow } from '../../utils/report-series';
import { ChartLegend } from './chart-legend';
import { useChartSize } from './chart-size';
import { axisTick, chartMargin, colourAt, gridStroke, stopColour, valueWith } from './chart-style';

interface SolventChartProps {
  /** Per month: `voc` emitted that month and `running`, the calendar year's total so far. */
  data: ChartRow[];
  threshold: number | null;
  unit: string;
}

/** VOC per month as bars, the year's running total as a line, and the yearly threshold across. */
export function SolventChart({ data, threshold, unit }: SolventChartProps) {
  const size = useChartSize();
  return (
    <>
      <ComposedChart {...size} accessibilityLayer={false} data={data} margin={chartMargin}>
        <CartesianGrid vertical={false} stroke={gridStroke} />
        <XAxis dataKey="x" tick={axisTick} tickFormatter={(x) => monthWords(String(x))} />
        <YAxis tick={axisTick} width="auto" label={{ value: `VOC ${unit}`, angle: -90, position: 'insideLeft', style: axisTick }} />
        <Tooltip formatter={valueWith(unit)} labelFormatter={(x) => monthWords(String(x))} />
        <Bar dataKey="voc" name="VOC this month" fill={colourAt(0)} isAnimationActive={false} />
        <Line dataKey="running" name="Running total this year" stroke={colourAt(1)} strokeWidth={2} isAnimationActive={false} />
        {threshold !== null && (
          <ReferenceLine y={threshold} stroke={stopColour} strokeDasharray="6 4" ifOverflow="extendDomain" label={{ value: `Yearly threshold ${threshold} ${unit}`, position: 'insideTopLeft', fill: stopColour, fontSize: 12 }} />
        )}
      </ComposedChart>
      <ChartLegend
        entries={[
          { label: 'VOC this month', colour: colourAt(0), mark: 'bar' },
          { label: 'Running total this year', colour: colourAt(1), mark: 'line' },
          ...(threshold === null ? [] : [{ label: 'Yearly threshold', colour: stopColour, mark: 'dashed-line' as const }]),
        ]}
      />
    </>
  );
}
