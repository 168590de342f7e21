import { Bar, BarChart, CartesianGrid, Tooltip, XAxis, YAxis } from 'recharts';
import { weekShortWords, weekWords } from '../../utils/report-range';
import type { ChartRow } from '../../utils/report-series';
import { ChartLegend } from './chart-legend';
import { useChartSize } from './chart-size';
import { axisTick, chartMargin, colourAt, gridStroke, valueWith } from './chart-style';

interface BoothUseChartProps {
  data: ChartRow[];
  booths: { id: number; name: string }[];
}

/** Per week, a pair of bars for each booth: booked (pale) beside sprayed (solid) in the booth's colour. */
export function BoothUseChart({ data, booths }: BoothUseChartProps) {
  const size = useChartSize();
  const legend = booths.flatMap((booth, index) => [
    { label: `${booth.name}: booked`, colour: colourAt(index), mark: 'pale-bar' as const },
    { label: `${booth.name}: sprayed`, colour: colourAt(index), mark: 'bar' as const },
  ]);
  return (
    <>
      <BarChart {...size} accessibilityLayer={false} data={data} margin={chartMargin}>
        <CartesianGrid vertical={false} stroke={gridStroke} />
        <XAxis dataKey="x" tick={axisTick} tickFormatter={weekShortWords} />
        <YAxis tick={axisTick} width="auto" label={{ value: 'Hours', angle: -90, position: 'insideLeft', style: axisTick }} />
        <Tooltip formatter={valueWith('h')} labelFormatter={(week) => weekWords(String(week))} />
        {booths.flatMap((booth, index) => [
          <Bar key={`${booth.id}-booked`} dataKey={`b${booth.id}booked`} name={`${booth.name}: booked`} fill={colourAt(index)} fillOpacity={0.35} stroke={colourAt(index)} isAnimationActive={false} />,
          <Bar key={`${booth.id}-sprayed`} dataKey={`b${booth.id}sprayed`} name={`${booth.name}: sprayed`} fill={colourAt(index)} isAnimationActive={false} />,
        ])}
      </BarChart>
      <ChartLegend entries={legend} />
    </>
  );
}
