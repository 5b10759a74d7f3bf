/**
 * The chart of a design report: its sampled curves, operating points and preferred regions
 * mapped to the {@link ChartSpec} that `renderChart` draws.
 *
 * @module
 */
import type { DesignReport, SampledCurve, UnitSystem } from '../design/core';
import { displayUnits } from '../design/core';
import { argumentError } from '../errors';
import { guardOptions } from '../guards';
import type { ChartSeries, ChartSpec } from './chart-spec';
import { chosenUnits } from './format-values';

/** Options of {@link chartSpecFromReport}. */
export interface ChartFromReportOptions {
  /** Units of the axes; default the report's own (`report.units`). */
  readonly units?: UnitSystem;
}

function series(path: string, curves: readonly SampledCurve[]): ChartSeries[] {
  // A curve is drawn through two samples or more: one with fewer (a candidate whose curve
  // could not be sampled) is left out of the chart rather than making the chart fail.
  return curves.flatMap((c, i) => {
    if (c.flows.length !== c.values.length) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `${path}[${i}].values`,
        `${c.values.length} values for ${c.flows.length} flows`,
        undefined,
        'as many values as flows',
      );
    }
    // Samples without a finite flow and value (where a curve has no value) are not drawn.
    const points = c.flows
      .map((flow, k) => ({ flow, value: Number(c.values[k]) }))
      .filter((p) => Number.isFinite(p.flow) && Number.isFinite(p.value));
    if (points.length < 2) return [];
    return [
      {
        name: c.name,
        ...(c.group === undefined ? {} : { group: c.group }),
        ...(c.speed === undefined ? {} : { speed: c.speed }),
        ...(c.maxSpeed === undefined ? {} : { maxSpeed: c.maxSpeed }),
        points,
      },
    ];
  });
}

/** The colour group of a candidate: the label its curves carry (`"B (2 in parallel)"`). */
function groupOf(report: DesignReport, candidate: string): string {
  const c = report.candidates.find((k) => k.name === candidate);
  return c !== undefined && c.count > 1 ? `${c.name} (${c.count} in ${c.arrangement})` : candidate;
}

/**
 * Maps a report's curves (`report.curves`, SI) to a chart: system curves per operating case,
 * pump curves per candidate and speed, efficiency and NPSH-required curves per candidate,
 * NPSH available per case, the preferred operating regions and every operating point. The
 * title is the report's name; the axes are in the flow and head units of
 * {@link displayUnits} (`m3/h` and `m`, or `gal/min` and `ft`). The numbers stay SI: the
 * chart converts them for its axes.
 *
 * @param report - a report from `evaluateDesign`
 * @param options - `units` (`'si'` or `'us'`, default `report.units`)
 * @returns a {@link ChartSpec} for `renderChart`
 * @throws HeadflowError `INVALID_ARGUMENT` for units other than `'si'` and `'us'` or a sampled
 *   curve with fewer values than flows. (`renderChart` then checks the numbers themselves:
 *   a report without any curve cannot be drawn.)
 * @example
 * ```ts
 * // report = evaluateDesign(design) of docs/examples/cooling-loop.ts
 * const spec = chartSpecFromReport(report, { units: 'us' });
 * spec.units; // { flow: 'gal/min', head: 'ft' }
 * spec.systemCurves.map((s) => s.name); // ['cold loop', 'hot water, 80 degC']
 * const svg = renderChart(spec); // '<svg ...>...</svg>'
 * ```
 */
export function chartSpecFromReport(
  report: DesignReport,
  options?: ChartFromReportOptions | null,
): ChartSpec {
  const o = guardOptions<ChartFromReportOptions>('options', options);
  const u = displayUnits(chosenUnits(report, o.units as UnitSystem | undefined));
  const c = report.curves;
  if (c === undefined) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'report.curves',
      'none',
      undefined,
      'a report evaluated with its curves: evaluateDesign(input, { curves: true })',
    );
  }
  return {
    title: report.name,
    units: { flow: u.flow, head: u.head },
    pumpCurves: series('curves.pumps', c.pumps),
    systemCurves: series('curves.systems', c.systems),
    operatingPoints: c.points
      .filter((p) => Number.isFinite(p.flow) && Number.isFinite(p.head))
      .map((p) => ({
        name: p.name,
        flow: p.flow,
        head: p.head,
        ...(p.candidate === undefined ? {} : { group: groupOf(report, p.candidate) }),
      })),
    dutyPoints: (c.dutyPoints ?? [])
      .filter((d) => Number.isFinite(d.flow) && Number.isFinite(d.head))
      .map((d) => ({ name: d.case, flow: d.flow, head: d.head })),
    preferredRegions: c.preferredRegions
      .filter((r) => Number.isFinite(r.minFlow) && Number.isFinite(r.maxFlow))
      .map((r) => ({
        name: r.name,
        minFlow: r.minFlow,
        maxFlow: r.maxFlow,
        ...(r.group === undefined ? {} : { group: r.group }),
      })),
    efficiencyCurves: series('curves.efficiency', c.efficiency),
    npshRequired: series('curves.npshRequired', c.npshRequired),
    npshAvailable: series('curves.npshAvailable', c.npshAvailable),
  };
}
