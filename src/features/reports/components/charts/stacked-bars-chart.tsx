import { Bar, BarChart, CartesianGrid, Tooltip, XAxis, YAxis } from 'recharts';
import type { ChartRow, ChartSeries } from '../../utils/report-series';
import { ChartLegend } from './chart-legend';
import { useChartSize } from './chart-size';
import { axisTick, chartMargin, colourAt, gridStroke, valueWith } from './chart-style';

interface StackedBarsChartProps {
  data: ChartRow[];
  series: ChartSeries[];
  /** The unit on the value axis and in the tooltip ("m²", "coats"). */
  unit: string;
  digits?: number;
  xWords: (x: string) => string;
  xLongWords?: (x: string) => string;
}

/** One bar per period, stacked by series: area by product kind or job per week, rework by reason per month. */
export function StackedBarsChart({ data, series, unit, digits = 1, xWords, xLongWords = xWords }: StackedBarsChartProps) {
  const size = useChartSize();
  return (
    <>
      <BarChart {...size} accessibilityLayer={false} data={data} margin={chartMargin}>
        <CartesianGrid vertical={false} stroke={gridStroke} />
        <XAxis dataKey="x" tick={axisTick} tickFormatter={(x) => xWords(String(x))} />
        <YAxis tick={axisTick} width="auto" allowDecimals={digits > 0} label={{ value: unit, angle: -90, position: 'insideLeft', style: axisTick }} />
        <Tooltip formatter={valueWith(unit, digits)} labelFormatter={(x) => xLongWords(String(x))} />
        {series.map((s, index) => (
          <Bar key={s.key} dataKey={s.key} name={s.label} stackId="total" fill={colourAt(index)} isAnimationActive={false} />
        ))}
      </BarChart>
      <ChartLegend entries={series.map((s, index) => ({ label: s.label, colour: colourAt(index), mark: 'bar' }))} />
    </>
  );
}
