/**
 * Input checks of {@link renderChart}: every number finite, flows not negative, efficiencies
 * within 0..1, every series with two points or more, known units of the right dimension.
 * Each failure names the path of the offending value (`pumpCurves[1].points[3].value`).
 *
 * @module
 * @internal
 */
import { argumentError, checkFinite, checkNonNegative, HeadflowError } from '../errors';
import { guardArray, guardRange, guardRecord, guardString, kindOf } from '../guards';
import { isUnit, UNITS } from '../units/index';
import type { ChartBand, ChartMarker, ChartOptions, ChartSeries, ChartSpec } from './chart-spec';

/** Smallest width and height of a chart, px. */
export const MIN_SIZE = 100;
/** Largest width and height of a chart, px. */
export const MAX_SIZE = 20_000;

/** What a series' `value` means, for its checks and the unit in messages. */
export type SeriesKind = 'head' | 'efficiency' | 'npsh' | 'npshAvailable';

function checkName(path: string, name: unknown): void {
  if (typeof name !== 'string') {
    throw argumentError('INVALID_ARGUMENT', path, name, undefined, 'a string');
  }
}

function checkList(path: string, list: unknown): asserts list is readonly unknown[] {
  if (!Array.isArray(list)) {
    throw argumentError('INVALID_ARGUMENT', path, list, undefined, 'an array');
  }
  guardArray(path, list, { max: 100_000 });
}

function checkUnit(path: string, unit: unknown, dimension: 'flow' | 'length'): void {
  if (!isUnit(unit)) {
    throw new HeadflowError(
      'UNKNOWN_UNIT',
      `${path} ${typeof unit === 'string' ? JSON.stringify(unit) : kindOf(unit)} is not a known unit.`,
      { parameter: path, value: unit, allowed: `a unit of ${dimension} from the catalogue` },
    );
  }
  if (UNITS[unit].dimension !== dimension) {
    throw new HeadflowError(
      'WRONG_DIMENSION',
      `${path} ${JSON.stringify(unit)} is a unit of ${UNITS[unit].dimension}, not of ${dimension}.`,
      { parameter: path, value: unit, allowed: `a unit of ${dimension}` },
    );
  }
}

function checkSeries(path: string, series: ChartSeries, kind: SeriesKind): void {
  guardRecord(path, series);
  checkName(`${path}.name`, series.name);
  if (series.group !== undefined) guardString(`${path}.group`, series.group, 10_000);
  checkList(`${path}.points`, series.points);
  guardArray(`${path}.points`, series.points, { max: 1_000_000 });
  if (series.points.length < 2) {
    throw argumentError(
      'INVALID_ARGUMENT',
      `${path}.points`,
      `${series.points.length} point(s)`,
      undefined,
      'at least 2 points',
      'A curve needs two points or more; show a single point as an operating point.',
    );
  }
  series.points.forEach((p, i) => {
    const at = `${path}.points[${i}]`;
    guardRecord(at, p);
    checkNonNegative(`${at}.flow`, p.flow, 'm3/s');
    if (kind === 'efficiency') {
      if (typeof p.value !== 'number' || !Number.isFinite(p.value) || p.value < 0 || p.value > 1) {
        throw argumentError(
          'INVALID_ARGUMENT',
          `${at}.value`,
          p.value,
          undefined,
          '0 <= value <= 1',
        );
      }
    } else checkFinite(`${at}.value`, p.value, 'm');
  });
}

function checkMarker(path: string, m: ChartMarker): void {
  guardRecord(path, m);
  checkName(`${path}.name`, m.name);
  checkNonNegative(`${path}.flow`, m.flow, 'm3/s');
  checkFinite(`${path}.head`, m.head, 'm');
}

function checkBand(path: string, b: ChartBand): void {
  guardRecord(path, b);
  checkName(`${path}.name`, b.name);
  if (b.group !== undefined) guardString(`${path}.group`, b.group, 10_000);
  checkNonNegative(`${path}.minFlow`, b.minFlow, 'm3/s');
  checkNonNegative(`${path}.maxFlow`, b.maxFlow, 'm3/s');
  if (b.maxFlow < b.minFlow) {
    throw argumentError(
      'INVALID_ARGUMENT',
      `${path}.maxFlow`,
      b.maxFlow,
      'm3/s',
      `>= minFlow (${b.minFlow} m3/s)`,
    );
  }
}

/**
 * Checks a chart spec and its options; throws the first problem found.
 * @internal
 */
export function validateChart(spec: ChartSpec, options: ChartOptions): void {
  if (typeof spec !== 'object' || spec === null) {
    throw argumentError('INVALID_ARGUMENT', 'spec', spec, undefined, 'a ChartSpec object');
  }
  // Stated bounds: a drawing from 100 to 20000 px a side (a huge size made the layout loop
  // for seconds and a size of 1e21 px broke number formatting).
  if (options.width !== undefined) {
    guardRange('options.width', options.width, { min: MIN_SIZE, max: MAX_SIZE, unit: 'px' });
  }
  if (options.height !== undefined) {
    guardRange('options.height', options.height, { min: MIN_SIZE, max: MAX_SIZE, unit: 'px' });
  }
  if (typeof spec.title !== 'string') {
    throw argumentError('INVALID_ARGUMENT', 'title', spec.title, undefined, 'a string');
  }
  if (typeof spec.title === 'string') guardString('title', spec.title, 10_000);
  if (typeof spec.units !== 'object' || spec.units === null) {
    throw argumentError('INVALID_ARGUMENT', 'units', spec.units, undefined, '{ flow, head }');
  }
  checkUnit('units.flow', spec.units.flow, 'flow');
  checkUnit('units.head', spec.units.head, 'length');

  const seriesLists: [string, readonly ChartSeries[] | undefined, SeriesKind][] = [
    ['pumpCurves', spec.pumpCurves, 'head'],
    ['systemCurves', spec.systemCurves, 'head'],
    ['efficiencyCurves', spec.efficiencyCurves, 'efficiency'],
    ['npshRequired', spec.npshRequired, 'npsh'],
    ['npshAvailable', spec.npshAvailable, 'npshAvailable'],
  ];
  let curves = 0;
  for (const [name, list, kind] of seriesLists) {
    if (list === undefined && name === 'npshAvailable') continue;
    checkList(name, list);
    for (const [i, s] of list.entries()) checkSeries(`${name}[${i}]`, s as ChartSeries, kind);
    curves += list.length;
  }
  checkList('operatingPoints', spec.operatingPoints);
  for (const [i, m] of spec.operatingPoints.entries()) checkMarker(`operatingPoints[${i}]`, m);
  if (spec.dutyPoints !== undefined) {
    checkList('dutyPoints', spec.dutyPoints);
    for (const [i, m] of spec.dutyPoints.entries()) checkMarker(`dutyPoints[${i}]`, m);
  }
  checkList('preferredRegions', spec.preferredRegions);
  for (const [i, b] of spec.preferredRegions.entries()) checkBand(`preferredRegions[${i}]`, b);
  if (curves === 0) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'spec',
      'no curves',
      undefined,
      'at least one pump, system, efficiency or NPSH curve',
    );
  }
}
