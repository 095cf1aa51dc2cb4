/**
 * The calculators' charts: our own SVG, drawn on the server at a phone's width and
 * redrawn at the card's width once the browser has measured it.
 */
export { default as LineChartCard, type LinePoint, type ChartAxis } from './LineChartCard';
export { default as BarChartCard, type BarDatum } from './BarChartCard';
export { chartUnit } from './units';
