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
  type NetworkDesignInput,
  type UnitSystem,
} from '../design/index';
// The scenario reader from its own file (the CLI bundle keeps the design barrel small).
import { readDesignFile } from '../design/scenario-file';
import {
  chartSpecFromReport,
  renderChart,
  renderHtml,
  renderJson,
  renderMarkdown,
  renderSchematic,
  renderSelection,
  renderText,
} from '../report/index';
import { type PumpCatalogue, readCatalogue, type Selection, selectPumps } from '../select/index';

/** Report formats the command writes. */
export type ReportFormat = 'text' | 'markdown' | 'json' | 'html';

/** The library functions the command calls. */
export interface Engine {
  /** Either form of scenario file: a line or a network. */
  readScenario(json: string, source: string): DesignInput | NetworkDesignInput;
  /** `curves`: sample the chart's curves (for `--chart` and the HTML page); default false. */
  evaluate(design: DesignInput | NetworkDesignInput, curves?: boolean): DesignReport;
  /** `summary`: the short form instead of the full calculation sheet; default false. */
  render(
    report: DesignReport,
    format: ReportFormat,
    units: UnitSystem | undefined,
    summary?: boolean,
  ): string;
  chart(report: DesignReport, units: UnitSystem | undefined): string;
  /** The schematic SVG of a network report. */
  schematic(report: DesignReport, units: UnitSystem | undefined): string;
  readCatalogue(json: string, source: string): PumpCatalogue;
  select(design: DesignInput, catalogue: PumpCatalogue): Selection;
  renderSelection(
    selection: Selection,
    format: Exclude<ReportFormat, 'html'>,
    units: UnitSystem | undefined,
  ): string;
  /** The chart of the design with the leading passing ways of a selection as candidates. */
  selectionChart(design: DesignInput, selection: Selection, units: UnitSystem | undefined): string;
}

/** Ways of a selection drawn on its chart. */
const CHARTED = 3;

function unitsOption(units: UnitSystem | undefined): { units?: UnitSystem } {
  return units === undefined ? {} : { units };
}

/** The library itself. */
export const libraryEngine: Engine = {
  readScenario: (json, source) => readDesignFile(json, { source }),
  evaluate: (design, curves = false) => evaluateDesign(design, { curves }),
  render(report, format, units, summary = false) {
    const options = { ...unitsOption(units), summary };
    if (format === 'markdown') return renderMarkdown(report, options);
    if (format === 'json') return renderJson(report, unitsOption(units));
    if (format === 'html') return renderHtml(report, options);
    return renderText(report, options);
  },
  chart: (report, units) => renderChart(chartSpecFromReport(report, unitsOption(units))),
  schematic: (report, units) => renderSchematic(report, unitsOption(units)),
  readCatalogue: (json, source) => readCatalogue(json, { source }),
  select: (design, catalogue) => selectPumps(design, catalogue),
  renderSelection: (selection, format, units) =>
    renderSelection(selection, { format, ...unitsOption(units) }),
  selectionChart(design, selection, units) {
    const leading = selection.ranked.filter((e) => e.passed).slice(0, CHARTED);
    const shown = leading.length > 0 ? leading : selection.ranked.slice(0, 1);
    const report = evaluateDesign(
      { ...design, candidates: shown.map((e) => e.candidate) },
      { curves: true },
    );
    return renderChart(chartSpecFromReport(report, unitsOption(units)));
  },
};
