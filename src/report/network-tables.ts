/**
 * The node and link tables of a network report, for the printed sheet (text, Markdown, HTML)
 * and for the JSON envelope: each case's network solved at the duty, in the report's one unit
 * system (pressures absolute and gauge against the report's atmosphere).
 *
 * @module
 * @internal
 */
import type { DesignReport, DisplayUnits, NetworkTables } from '../design/core';
import type { Say } from '../design/say';
import {
  type Dimension,
  type Length,
  type Pressure,
  type Quantity,
  to,
  type UnitOf,
} from '../units/index';
import type { Block, Column } from './format-document';
import { DASH, formatFixed, formatGrouped, formatIn } from './format-values';

const left = (header: string): Column => ({ header, align: 'left' });
const right = (header: string): Column => ({ header, align: 'right' });

function referenced(unit: string, reference: 'absolute' | 'gauge'): string {
  if (unit === 'psi') return reference === 'absolute' ? 'psia' : 'psig';
  return `${unit} ${reference === 'absolute' ? 'abs' : 'gauge'}`;
}

/** A gauge pressure, with round-off of the absolute pressure (1e-9 of it) shown as 0. */
function gaugeOf(absolute: number, atmosphere: number): number {
  const g = absolute - atmosphere;
  return Math.abs(g) <= 1e-9 * atmosphere ? 0 : g;
}

/** The node table of one case. */
export function nodeTable(t: NetworkTables, atmosphere: number, s: Say): Block {
  const u = s.units;
  const p = u.pressure;
  const gauge = (x: number | undefined) =>
    x === undefined ? DASH : formatIn(gaugeOf(x, atmosphere) as Pressure, p);
  return {
    kind: 'table',
    columns: [
      left('Node'),
      left('Kind'),
      right(`Elevation\n(${u.length})`),
      right(`Head\n(${u.head})`),
      right(`Pressure\n(${referenced(p, 'absolute')})`),
      right(`Pressure\n(${referenced(p, 'gauge')})`),
      right(`Outflow\n(${s.sym(u.flow)})`),
      right(`Service\nminimum\n(${referenced(p, 'gauge')})`),
      right(`Shortfall\n(${p})`),
    ],
    rows: t.nodes.map((n) => [
      n.id,
      n.isolated ? `${n.kind}, isolated` : n.kind,
      formatIn(n.elevation, u.length),
      formatIn(n.head, u.head),
      formatIn(n.pressure, p),
      gauge(n.pressure),
      formatIn(n.outflow, u.flow),
      gauge(n.minPressure),
      n.shortfall === undefined ? DASH : formatIn(n.shortfall, p),
    ]),
  };
}

/** The link table of one case. */
export function linkTable(t: NetworkTables, s: Say): Block {
  const u = s.units;
  return {
    kind: 'table',
    columns: [
      left('Link'),
      left('From - to'),
      left('State'),
      right(`Flow\n(${s.sym(u.flow)})`),
      right(`Velocity\n(${u.velocity})`),
      right(`Head loss\n(${u.head})`),
      right('Re'),
      right('Friction\nfactor'),
    ],
    rows: t.links.map((l) => [
      l.id === t.pumpLink ? `${l.id} (pump)` : l.id,
      `${l.from} - ${l.to}`,
      l.state,
      formatIn(l.flow, u.flow),
      formatIn(l.velocity, u.velocity),
      formatIn(l.headLoss, u.head),
      l.reynolds === undefined ? DASH : formatGrouped(l.reynolds),
      l.frictionFactor === undefined ? DASH : formatFixed(l.frictionFactor, 4),
    ]),
  };
}

/** The network blocks of a report's full sheet: for each case, its nodes and links at the duty. */
export function networkBlocks(report: DesignReport, s: Say): Block[] {
  const blocks: Block[] = [];
  const layout = report.network;
  if (layout !== undefined) {
    const service = layout.service.map(
      (r) =>
        `${r.node}: at least ${formatIn((r.minPressure - report.atmosphere) as Pressure, s.units.pressure)} ${referenced(s.units.pressure, 'gauge')}`,
    );
    blocks.push({
      kind: 'fields',
      rows: [
        [
          'Network',
          `${layout.nodes.length} nodes, ${layout.links.length} links; the candidate pumps go in link '${layout.pumpLink}'`,
        ],
        [
          'Duty',
          service.length === 0
            ? 'a flow through the pump link'
            : `the least pump head that meets every service pressure (${service.join('; ')})`,
        ],
      ],
    });
  }
  for (const d of report.duty) {
    const n = d.network;
    if (n === undefined) continue;
    blocks.push({
      kind: 'subheading',
      text: `Network at the duty: ${d.case} (${formatIn(n.dutyFlow, s.units.flow)} ${s.sym(s.units.flow)} through the pump link; ${n.tables.iterations} iterations, head residual ${to(n.tables.headResidual as Length, s.units.head).toExponential(1)} ${s.units.head})`,
    });
    blocks.push(nodeTable(n.tables, report.atmosphere, s), linkTable(n.tables, s));
  }
  return blocks;
}

/** A quantity of the JSON envelope. */
function quantity<D extends Dimension>(
  x: Quantity<D> | number | undefined,
  unit: UnitOf<D>,
): { value: number; unit: string } | null {
  if (x === undefined || !Number.isFinite(x)) return null;
  const v = Number(to(x as Quantity<D>, unit).toPrecision(6));
  return { value: v === 0 ? 0 : v, unit };
}

/** The node and link tables of one case for the JSON envelope. */
export function networkJson(t: NetworkTables, atmosphere: number, u: DisplayUnits) {
  return {
    pumpLink: t.pumpLink,
    duty: t.duty,
    iterations: t.iterations,
    headResidual: t.headResidual,
    nodes: t.nodes.map((n) => ({
      id: n.id,
      kind: n.kind,
      isolated: n.isolated,
      elevation: quantity(n.elevation, u.length),
      head: quantity(n.head, u.head),
      pressure: {
        absolute: quantity(n.pressure, u.pressure),
        gauge: quantity(gaugeOf(n.pressure, atmosphere) as Pressure, u.pressure),
      },
      outflow: quantity(n.outflow, u.flow),
      minPressure:
        n.minPressure === undefined
          ? null
          : {
              absolute: quantity(n.minPressure, u.pressure),
              gauge: quantity((n.minPressure - atmosphere) as Pressure, u.pressure),
            },
      shortfall: quantity(n.shortfall, u.pressure),
    })),
    links: t.links.map((l) => ({
      id: l.id,
      kind: l.kind,
      from: l.from,
      to: l.to,
      state: l.state,
      flow: quantity(l.flow, u.flow),
      velocity: quantity(l.velocity, u.velocity),
      headLoss: quantity(l.headLoss, u.head),
      reynolds: l.reynolds === undefined ? null : Number(l.reynolds.toPrecision(6)),
      frictionFactor:
        l.frictionFactor === undefined ? null : Number(l.frictionFactor.toPrecision(6)),
    })),
  };
}
