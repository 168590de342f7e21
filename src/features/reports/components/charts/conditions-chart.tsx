import { CartesianGrid, ComposedChart, Line, ReferenceLine, Scatter, Tooltip, XAxis, YAxis } from 'recharts';
import { ChartLegend } from './chart-legend';
import { useChartSize } from './chart-size';
import { axisTick, cautionColour, chartMargin, colourAt, gridStroke, stopColour, valueWith } from './chart-style';

interface ConditionsChartPoint {
  t: number;
  air: number;
  rh: number;
  margin: number;
}

interface ConditionsChartLimits {
  minTemp: number | null;
  maxRh: number | null;
  minMargin: number;
}

interface ConditionsChartProps {
  points: ConditionsChartPoint[];
  /** Coats made outside limits, placed at their air temperature. */
  outside: { t: number; air: number }[];
  limits: ConditionsChartLimits;
  temperatureUnit: string;
  timeWords: (t: number) => string;
  tickWords: (t: number) => string;
}

type LabelPlace = 'insideTopLeft' | 'insideTopRight' | 'insideBottomLeft';
// Each limit's words sit in their own corner, so lines that happen to meet do not print over each other.
const lineLabel = (value: string, fill: string, position: LabelPlace) => ({ value, position, fill, fontSize: 12 });

/**
 * Air temperature and dew-point margin on the left axis, humidity on the right, with the limits
 * of the strictest product sprayed drawn across, and every coat made outside them marked.
 */
export function ConditionsChart({ points, outside, limits, temperatureUnit, timeWords, tickWords }: ConditionsChartProps) {
  const times = [...points.map((p) => p.t), ...outside.map((c) => c.t)];
  const domain = [Math.min(...times), Math.max(...times)];
  const size = useChartSize();
  return (
    <>
      <ComposedChart {...size} accessibilityLayer={false} data={points} margin={chartMargin}>
        <CartesianGrid stroke={gridStroke} />
        <XAxis dataKey="t" type="number" scale="time" domain={domain} tick={axisTick} tickFormatter={(t) => tickWords(Number(t))} />
        <YAxis yAxisId="temp" tick={axisTick} width="auto" label={{ value: temperatureUnit, angle: -90, position: 'insideLeft', style: axisTick }} />
        <YAxis yAxisId="rh" orientation="right" domain={[0, 100]} tick={axisTick} width="auto" label={{ value: 'RH %', angle: 90, position: 'insideRight', style: axisTick }} />
        <Tooltip labelFormatter={(t) => timeWords(Number(t))} formatter={(value, name) => (name === 'Relative humidity' ? valueWith('%', 0)(value) : valueWith(temperatureUnit)(value))} />
        <Line yAxisId="temp" dataKey="air" name="Air temperature" stroke={colourAt(0)} strokeWidth={2} dot={false} isAnimationActive={false} />
        <Line yAxisId="temp" dataKey="margin" name="Dew-point margin" stroke={colourAt(1)} strokeWidth={2} strokeDasharray="6 3" dot={false} isAnimationActive={false} />
        <Line yAxisId="rh" dataKey="rh" name="Relative humidity" stroke={colourAt(2)} strokeWidth={2} dot={false} isAnimationActive={false} />
        {limits.minTemp !== null && (
          <ReferenceLine yAxisId="temp" y={limits.minTemp} stroke={stopColour} strokeDasharray="4 4" ifOverflow="extendDomain" label={lineLabel(`Min. temperature ${limits.minTemp} ${temperatureUnit}`, stopColour, 'insideTopLeft')} />
        )}
        <ReferenceLine yAxisId="temp" y={limits.minMargin} stroke={cautionColour} strokeDasharray="2 4" ifOverflow="extendDomain" label={lineLabel(`Min. dew-point margin ${limits.minMargin} ${temperatureUnit}`, cautionColour, 'insideBottomLeft')} />
        {limits.maxRh !== null && (
          <ReferenceLine yAxisId="rh" y={limits.maxRh} stroke={stopColour} strokeDasharray="8 4" ifOverflow="extendDomain" label={lineLabel(`Max. RH ${limits.maxRh} %`, stopColour, 'insideTopRight')} />
        )}
        {/* Given an empty list, recharts falls back to the chart's data and would mark every reading. */}
        {outside.length > 0 && <Scatter yAxisId="temp" data={outside} dataKey="air" name="Coat outside limits" fill={stopColour} shape="diamond" isAnimationActive={false} />}
      </ComposedChart>
      <ChartLegend
        entries={[
          { label: 'Air temperature', colour: colourAt(0), mark: 'line' },
          { label: 'Dew-point margin', colour: colourAt(1), mark: 'dashed-line' },
          { label: 'Relative humidity', colour: colourAt(2), mark: 'line' },
          { label: 'Limits', colour: stopColour, mark: 'dashed-line' },
          ...(outside.length > 0 ? [{ label: 'Coat outside limits', colour: stopColour, mark: 'point' as const }] : []),
        ]}
      />
    </>
  );
}
