import { Bar, BarChart, CartesianGrid, Tooltip, XAxis, YAxis } from 'recharts';
import { ChartLegend } from './chart-legend';
import { useChartSize } from './chart-size';
import { axisTick, chartMargin, colourAt, gridStroke, valueWith } from './chart-style';

interface MaterialChartProps {
  data: { product: string; estimated: number; used: number }[];
  unit: string;
}

/** Estimated beside used for each product; bars run across so long product names stay readable. */
export function MaterialChart({ data, unit }: MaterialChartProps) {
  const size = useChartSize(Math.max(200, 56 * data.length + 80));
  return (
    <>
      <BarChart {...size} accessibilityLayer={false} layout="vertical" data={data} margin={chartMargin}>
        <CartesianGrid horizontal={false} stroke={gridStroke} />
        <XAxis type="number" tick={axisTick} tickFormatter={(v) => `${v} ${unit}`} />
        <YAxis type="category" dataKey="product" tick={axisTick} width={150} />
        <Tooltip formatter={valueWith(unit, 2)} />
        <Bar dataKey="estimated" name="Estimated" fill={colourAt(0)} fillOpacity={0.35} stroke={colourAt(0)} isAnimationActive={false} />
        <Bar dataKey="used" name="Used" fill={colourAt(1)} isAnimationActive={false} />
      </BarChart>
      <ChartLegend
        entries={[
          { label: 'Estimated', colour: colourAt(0), mark: 'pale-bar' },
          { label: 'Used', colour: colourAt(1), mark: 'bar' },
        ]}
      />
    </>
  );
}
