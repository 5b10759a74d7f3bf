/**
 * Reports of a pump selection: a design report rendered as terminal text, Markdown or JSON,
 * and the SVG chart of pump, system, efficiency and NPSH curves with operating points and
 * preferred operating regions.
 *
 * @module report
 */

export { checkMessage, displayUnits } from '../design/core';
export { renderChart } from './chart';
export { type ChartFromReportOptions, chartSpecFromReport } from './chart-from-report';
export type {
  ChartBand,
  ChartMarker,
  ChartOptions,
  ChartPoint,
  ChartSeries,
  ChartSpec,
} from './chart-spec';
export { type HtmlOptions, renderHtml } from './html';
export {
  type JsonCandidate,
  type JsonCaseDuty,
  type JsonCaseResult,
  type JsonCheck,
  type JsonCurve,
  type JsonCurveFit,
  type JsonCurves,
  type JsonEndPressure,
  type JsonEnvelope,
  type JsonFluid,
  type JsonMotor,
  type JsonOptions,
  type JsonQuantity,
  type JsonReport,
  type JsonRun,
  type JsonSamples,
  type JsonUnits,
  REPORT_FORMAT,
  renderJson,
  reportToPlain,
} from './json';
export { type MarkdownOptions, renderMarkdown } from './markdown';
export { renderSchematic, type SchematicOptions } from './schematic';
export {
  renderSelection,
  SELECTION_FORMAT,
  type SelectionRenderOptions,
} from './selection';
export { renderSizeChart, type SizeChartOptions } from './size-chart';
export { renderText, type TextOptions } from './text';
