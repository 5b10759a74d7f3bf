/**
 * What the command needs from the library: read a scenario file, evaluate the design, write
 * the report and the chart. `runCli` takes it as a parameter so that tests can stand in for
 * any part of it.
 *
 * @module
 */
import {
  type DesignInput,
  type DesignReport,
  evaluateDesign,
  type UnitSystem,
} from '../design/index';
// readScenario joins the design barrel when the lead exports it; until then, its own file.
import { readScenario } from '../design/scenario-file';
import {
  chartSpecFromReport,
  renderChart,
  renderHtml,
  renderJson,
  renderMarkdown,
  renderText,
} from '../report/index';

/** Report formats the command writes. */
export type ReportFormat = 'text' | 'markdown' | 'json' | 'html';

/** The library functions the command calls. */
export interface Engine {
  readScenario(json: string, source: string): DesignInput;
  /** `curves`: sample the chart's curves (for `--chart` and the HTML page); default false. */
  evaluate(design: DesignInput, curves?: boolean): DesignReport;
  /** `summary`: the short form instead of the full calculation sheet; default false. */
  render(
    report: DesignReport,
    format: ReportFormat,
    units: UnitSystem | undefined,
    summary?: boolean,
  ): string;
  chart(report: DesignReport, units: UnitSystem | undefined): string;
}

function unitsOption(units: UnitSystem | undefined): { units?: UnitSystem } {
  return units === undefined ? {} : { units };
}

/** The library itself. */
export const libraryEngine: Engine = {
  readScenario: (json, source) => readScenario(json, { source }),
  evaluate: (design, curves = false) => evaluateDesign(design, { curves }),
  render(report, format, units, summary = false) {
    const options = { ...unitsOption(units), summary };
    if (format === 'markdown') return renderMarkdown(report, options);
    if (format === 'json') return renderJson(report, unitsOption(units));
    if (format === 'html') return renderHtml(report, options);
    return renderText(report, options);
  },
  chart: (report, units) => renderChart(chartSpecFromReport(report, unitsOption(units))),
};
