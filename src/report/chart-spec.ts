/**
 * The input of {@link renderChart}: the curves, points and bands of a pump selection, in
 * coherent SI, and the units the reader wants to see them in.
 *
 * @module
 */
import type { UnitOf } from '../units/index';

/**
 * One point of a curve drawn against flow.
 *
 * `value` is in coherent SI and its meaning follows the list the series sits in: head in m
 * (pump and system curves), efficiency as a fraction 0..1 (efficiency curves), NPSH in m
 * (NPSH required and available).
 */
export interface ChartPoint {
  /** Volumetric flow, m3/s, >= 0. */
  readonly flow: number;
  /** Head (m), efficiency (fraction 0..1) or NPSH (m), after the list the series belongs to. */
  readonly value: number;
}

/**
 * A named curve against flow. It needs at least two points; they are drawn in ascending order
 * of flow whatever order they are given in.
 */
export interface ChartSeries {
  /** Shown in the legend and in the `data-name` attribute of the drawn path. Any text. */
  readonly name: string;
  /** At least two points, coherent SI. */
  readonly points: readonly ChartPoint[];
  /**
   * Colour group: series and bands with the same group share a colour (for example every
   * curve of one candidate: its head curves at each speed, efficiency, NPSH and region).
   * Without it, colour follows the position in the list.
   */
  readonly group?: string;
  /** For a pump curve: the speed it is drawn at (rad/s); the legend and the curve say it. */
  readonly speed?: number;
  /** For a pump curve: true when it is the highest speed the pump may run at. */
  readonly maxSpeed?: boolean;
}

/** A named operating point (where a pump curve meets a system curve). */
export interface ChartMarker {
  /** Shown beside the marker and in its `data-name` attribute. Any text. */
  readonly name: string;
  /** Volumetric flow, m3/s, >= 0. */
  readonly flow: number;
  /** Head, m (may be negative only where a system has a negative static head). */
  readonly head: number;
  /** The candidate (colour group) it belongs to, for its marker's colour. */
  readonly group?: string;
}

/** A named range of flow, drawn as a translucent vertical band (a preferred operating region). */
export interface ChartBand {
  /** Shown in the legend and in the `data-name` attribute of the band. Any text. */
  readonly name: string;
  /** Lower flow limit, m3/s, >= 0. */
  readonly minFlow: number;
  /** Upper flow limit, m3/s, >= minFlow. */
  readonly maxFlow: number;
  /**
   * Colour group: series and bands with the same group share a colour (for example every
   * curve of one candidate: its head curves at each speed, efficiency, NPSH and region).
   * Without it, colour follows the position in the list.
   */
  readonly group?: string;
}

/**
 * Everything one chart shows. Every number is in coherent SI: flow in m3/s, head and NPSH in
 * m, efficiency as a fraction 0..1. At least one series (of any kind) must be present.
 *
 * Series are coloured by their position in their own list, so list the candidates in the same
 * order in `pumpCurves`, `efficiencyCurves`, `npshRequired` and `preferredRegions` and each
 * candidate keeps one colour.
 */
export interface ChartSpec {
  /** Chart title, also the SVG document's `<title>`. */
  readonly title: string;
  /** Units for the axes: a flow unit (`'gal/min'`, `'L/s'`, `'m3/h'` ...) and a length unit for head and NPSH (`'ft'`, `'m'`). */
  readonly units: { readonly flow: UnitOf<'flow'>; readonly head: UnitOf<'length'> };
  /** Head (m) against flow, one per candidate and per speed it runs at. Solid lines. */
  readonly pumpCurves: readonly ChartSeries[];
  /** System head (m) against flow, one per operating case. Dashed black lines. */
  readonly systemCurves: readonly ChartSeries[];
  /** Operating points, one per candidate and case. Circles with a label. */
  readonly operatingPoints: readonly ChartMarker[];
  /** Preferred operating region of each candidate, as a band of flow. */
  readonly preferredRegions: readonly ChartBand[];
  /** Efficiency as a fraction 0..1 against flow; drawn on a secondary axis in %. Dotted lines. */
  readonly efficiencyCurves: readonly ChartSeries[];
  /** NPSH required (m) against flow; drawn in a lower panel with its own axis. Solid lines. */
  readonly npshRequired: readonly ChartSeries[];
  /** NPSH available (m) against flow, one per operating case; drawn in the lower panel. Dash-dot lines. */
  readonly npshAvailable?: readonly ChartSeries[];
  /** The duty point of each operating case (named by the case): drawn as a cross. */
  readonly dutyPoints?: readonly ChartMarker[];
}

/** Size of the drawing. */
export interface ChartOptions {
  /** Width in px (the SVG user unit), 100 to 20000. Default 800. */
  readonly width?: number;
  /** Height in px, 100 to 20000. Default 600. */
  readonly height?: number;
}
