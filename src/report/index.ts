/**
 * Reports of a pump selection. For now: the SVG chart of pump, system, efficiency and NPSH
 * curves with operating points and preferred operating regions.
 *
 * @module report
 */

export { renderChart } from './chart';
export type {
  ChartBand,
  ChartMarker,
  ChartOptions,
  ChartPoint,
  ChartSeries,
  ChartSpec,
} from './chart-spec';
