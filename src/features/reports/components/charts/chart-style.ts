import { formatNumber } from '../../../../lib/units-display';

/**
 * Series colours that stay tellable apart for the common colour-vision differences (a
 * blue/orange-led qualitative set), led by the app's lacquer green. Never the only cue: each chart
 * has a legend and the table beside it.
 */
const seriesColours = ['#1b5246', '#e69f00', '#0072b2', '#cc79a7', '#56b4e9', '#d55e00', '#009e73', '#95805c'];
export const colourAt = (index: number) => seriesColours[index % seriesColours.length];

export const stopColour = '#b4232a';
export const cautionColour = '#a35a00';
export const axisTick = { fill: '#3f362a', fontSize: 12 };
export const gridStroke = '#e6dccb';
export const chartMargin = { top: 16, right: 16, bottom: 4, left: 4 };

/** Tooltip figures: the value with its unit, to the precision the tables use. */
export const valueWith = (unit: string, digits = 1) => (value: unknown) => `${formatNumber(Number(value), digits)} ${unit}`;
