/**
 * A hand-built design report for the renderer tests: an invented process-cooling loop with
 * two operating cases and two invented candidate pump sets. Every number is invented, but
 * they agree with each other:
 *
 * - system head: design 12 + 18 (Q / 0.075)^2 m, aged 14.5 + 23.5 (Q / 0.075)^2 m (Q in m3/s);
 * - candidate A (one pump, fixed speed): H = 44 - 2032.83 Q^2 m, efficiency
 *   0.82 (1 - ((Q - 0.0804) / 0.0804)^2), NPSHr = 1.5 + 420 Q^2 m; its operating points are the
 *   intersections with the system curves;
 * - candidate B (two pumps in parallel, variable speed): H = 40 (n / 1480)^2 - 939.21 Q^2 m,
 *   which at 1480 rpm gives only 34.72 m at the duty flow, so it cannot serve the aged case;
 * - shaft power = rho g Q H / efficiency with rho = 996 kg/m3 (a round value for the demo).
 */
import type {
  CandidateReport,
  CaseDuty,
  Check,
  DesignReport,
  ReportCurves,
  SampledCurve,
} from '../../src/design/index';
import type { RunDetails } from '../../src/system/index';
import { q, si } from '../../src/units/index';

export const DESIGN_CASE = 'design, clean pipe';
/** A name with a `|`, to prove that Markdown escapes it. */
export const AGED_CASE = 'low level | aged pipe';

const QD = 0.075; // duty flow, m3/s (270 m3/h)
const systemDesign = (x: number): number => 12 + 18 * (x / QD) ** 2;
const systemAged = (x: number): number => 14.5 + 23.5 * (x / QD) ** 2;
const pumpA = (x: number): number => 44 - 2032.83 * x * x;
const effA = (x: number): number => 0.82 * (1 - ((x - 0.0804) / 0.0804) ** 2);
const npshrA = (x: number): number => 1.5 + 420 * x * x;
const pumpB = (x: number, rpm: number): number => 40 * (rpm / 1480) ** 2 - 939.21 * x * x;
const effB = (x: number): number => 0.78 * (1 - ((x - 0.1053) / 0.1053) ** 2);
const npshaDesign = (x: number): number => 10 - 0.5 * (x / QD) ** 2;
const npshaAged = (x: number): number => 7.4 - 1.2 * (x / QD) ** 2;

function sample(name: string, f: (x: number) => number, top = 0.11): SampledCurve {
  const flows = Array.from({ length: 12 }, (_, i) => (top * i) / 11);
  return { name, flows, values: flows.map(f) };
}

function run(name: string, flow: number, d: number, loss: number, rise: number): RunDetails {
  const velocity = (4 * flow) / (Math.PI * d * d);
  return {
    name,
    group: undefined,
    flow: si<'flow'>(flow),
    insideDiameter: si<'length'>(d),
    velocity: si<'velocity'>(velocity),
    reynolds: (velocity * d) / 0.8e-6,
    regime: 'turbulent',
    frictionFactor: 0.0165,
    law: 'darcy-weisbach',
    lawValue: undefined,
    pipeLoss: si<'length'>(loss * 0.7),
    fittingsLoss: si<'length'>(loss * 0.3),
    componentLoss: si<'length'>(0),
    totalLoss: si<'length'>(loss),
    pressureDrop: si<'pressure'>(loss * 996 * 9.80665),
    elevationChange: si<'length'>(rise),
  };
}

const FLUID = {
  name: 'water',
  temperature: q(30, 'degC'),
  density: q(996, 'kg/m3'),
  kinematicViscosity: q(0.8, 'mm2/s'),
  vaporPressure: q(4.25, 'kPa'),
};

function caseExtras(head: number) {
  return {
    fluid: FLUID,
    aged: false,
    suctionElevation: q(2, 'm'),
    dischargeElevation: q(14, 'm'),
    npshTerms: undefined,
    pumpDischargePressure: q(101.325 + head * 9.767, 'kPa'),
  };
}

const duty: CaseDuty[] = [
  {
    case: DESIGN_CASE,
    ...caseExtras(q(30, 'm')),
    head: q(30, 'm'),
    staticHead: q(12, 'm'),
    lossHead: q(18, 'm'),
    npshAvailable: q(9.5, 'm'),
    suctionPressure: q(101.325, 'kPa'),
    dischargePressure: q(301.325, 'kPa'),
    runs: [run('suction', QD, 0.25, 1.2, -2), run('discharge', QD, 0.2, 16.8, 14)],
  },
  {
    case: AGED_CASE,
    ...caseExtras(q(38, 'm')),
    aged: true,
    head: q(38, 'm'),
    staticHead: q(14.5, 'm'),
    lossHead: q(23.5, 'm'),
    npshAvailable: q(6.2, 'm'),
    suctionPressure: q(101.325, 'kPa'),
    dischargePressure: q(351.325, 'kPa'),
    runs: [run('suction', QD, 0.25, 1.6, -2), run('discharge', QD, 0.2, 21.9, 16.5)],
  },
];

const checksA: Check[] = [
  {
    id: 'preferred-region',
    severity: 'info',
    candidate: 'candidate A',
    case: DESIGN_CASE,
    message: 'Runs at 97 % of its best-efficiency flow, inside the preferred region.',
    values: { percentOfBep: 97.26 },
    source: 'ANSI/HI 9.6.3',
    words: {},
  },
];

const checksB: Check[] = [
  {
    id: 'no-operating-point',
    severity: 'error',
    candidate: 'candidate B',
    case: AGED_CASE,
    message: 'The set cannot deliver the duty flow in this case even at its maximum speed.',
    values: { requiredHead: 38, availableHead: 34.72 },
    source: 'common practice',
    words: {},
  },
  {
    id: 'npsh-data',
    severity: 'warning',
    candidate: 'candidate B',
    case: undefined,
    message: 'The curve has no NPSH required data, so cavitation was not checked.',
    values: {},
    source: 'ANSI/HI 9.6.1',
    words: {},
  },
];

const PUMP = {
  points: [],
  ratedSpeed: q(1480, 'rpm'),
  speed: q(1480, 'rpm'),
  maxSpeed: q(1480, 'rpm'),
  motorEfficiency: 0.94,
  driveEfficiency: undefined,
  motorSeries: 'iec' as const,
  bep: undefined,
};

const candidateA: CandidateReport = {
  name: 'candidate A',
  count: 1,
  arrangement: 'single',
  control: 'fixed',
  cases: [
    {
      case: DESIGN_CASE,
      failure: undefined,
      speed: q(1480, 'rpm'),
      flow: q(0.0782, 'm3/s'),
      head: q(31.57, 'm'),
      efficiency: 0.8194,
      shaftPower: q(29430, 'W'),
      percentOfBep: 97.26,
      region: 'preferred',
      npshAvailable: q(9.456, 'm'),
      npshRequired: q(4.068, 'm'),
      npshRatio: 2.324,
      velocities: [
        { run: 'suction', velocity: q(1.593, 'm/s') },
        { run: 'discharge', velocity: q(2.489, 'm/s') },
      ],
      inputPower: undefined,
      specificEnergy: undefined,
      iterations: 7,
    },
    {
      case: AGED_CASE,
      failure: undefined,
      speed: q(1480, 'rpm'),
      flow: q(0.06892, 'm3/s'),
      head: q(34.34, 'm'),
      efficiency: 0.8033,
      shaftPower: q(28780, 'W'),
      percentOfBep: 85.72,
      region: 'preferred',
      npshAvailable: q(6.387, 'm'),
      npshRequired: q(3.495, 'm'),
      npshRatio: 1.827,
      velocities: [
        { run: 'suction', velocity: q(1.404, 'm/s') },
        { run: 'discharge', velocity: q(2.194, 'm/s') },
      ],
      inputPower: undefined,
      specificEnergy: undefined,
      iterations: 8,
    },
  ],
  maxShaftPower: q(30020, 'W'),
  motor: {
    series: 'iec',
    rating: q(37, 'kW'),
    nameplate: 37,
    unit: 'kW',
    loadFraction: 30020 / 37000,
    serviceFactor: 1,
  },
  dutyOnlyMotor: {
    series: 'iec',
    rating: q(30, 'kW'),
    nameplate: 30,
    unit: 'kW',
    loadFraction: 29430 / 30000,
    serviceFactor: 1,
  },
  energy: {
    kWh: 274260,
    cost: { amount: 32911.2, currency: 'EUR' },
    control: 'throttle',
    hours: 8760,
  },
  pump: PUMP,
  curveFit: {
    head: {
      method: 'monotone',
      degree: undefined,
      selection: 'default',
      points: 5,
      rms: 0,
      maxResidual: 0,
      maxRelativeResidual: 0,
      withinTolerance: true,
      rSquared: 1,
    },
    efficiency: {
      method: 'polynomial',
      degree: 3,
      selection: 'default',
      points: 5,
      rms: 0.0011,
      maxResidual: 0.0018,
      maxRelativeResidual: 0.0025,
      withinTolerance: true,
      rSquared: 0.9995,
    },
  },
  checks: checksA,
  passed: true,
  rank: 1,
};

const HP = 550 * 0.3048 * 0.45359237 * 9.80665; // W per hp (550 ft lbf/s), NIST SP 811

const candidateB: CandidateReport = {
  name: 'candidate B',
  count: 2,
  arrangement: 'parallel',
  control: 'speed',
  cases: [
    {
      case: DESIGN_CASE,
      failure: undefined,
      speed: q(1390, 'rpm'),
      flow: q(0.075, 'm3/s'),
      head: q(30, 'm'),
      efficiency: 0.73446,
      shaftPower: q(29920, 'W'),
      percentOfBep: 75.84,
      region: 'allowable',
      npshAvailable: q(9.5, 'm'),
      npshRequired: undefined,
      npshRatio: undefined,
      velocities: [],
      inputPower: undefined,
      specificEnergy: undefined,
      iterations: 15,
    },
    {
      case: AGED_CASE,
      failure:
        'at its maximum speed of 1480 rpm the set gives 34.72 m at the duty flow; 38 m are needed',
      speed: undefined,
      flow: undefined,
      head: undefined,
      efficiency: undefined,
      shaftPower: undefined,
      percentOfBep: undefined,
      region: undefined,
      npshAvailable: undefined,
      npshRequired: undefined,
      npshRatio: undefined,
      velocities: [],
      inputPower: undefined,
      specificEnergy: undefined,
      iterations: 12,
    },
  ],
  maxShaftPower: q(17800, 'W'),
  motor: {
    series: 'nema',
    rating: si<'power'>(25 * HP),
    nameplate: 25,
    unit: 'hp',
    loadFraction: 17800 / (25 * HP),
    serviceFactor: 1,
  },
  dutyOnlyMotor: {
    series: 'nema',
    rating: si<'power'>(20 * HP),
    nameplate: 20,
    unit: 'hp',
    loadFraction: 14960 / (20 * HP),
    serviceFactor: 1.15,
  },
  energy: undefined,
  pump: { ...PUMP, maxSpeed: q(1480, 'rpm') },
  curveFit: {
    head: {
      method: 'polynomial',
      degree: 2,
      selection: 'given',
      points: 4,
      rms: 0.21,
      maxResidual: 0.31,
      maxRelativeResidual: 0.0082,
      withinTolerance: false,
      rSquared: 0.998,
    },
    efficiency: undefined,
  },
  checks: checksB,
  passed: false,
  rank: 2,
};

/** The invented report's curves. */
export const CURVES: ReportCurves = {
  systems: [sample(DESIGN_CASE, systemDesign), sample(AGED_CASE, systemAged)],
  pumps: [
    sample('candidate A', pumpA),
    sample('candidate B at 1390 rpm', (x) => pumpB(x, 1390), 0.1),
    sample('candidate B at 1480 rpm', (x) => pumpB(x, 1480), 0.1),
  ],
  efficiency: [
    sample('candidate A', (x) => Math.max(0, effA(x))),
    sample('candidate B', (x) => Math.max(0, effB(x))),
  ],
  npshRequired: [sample('candidate A', npshrA)],
  npshAvailable: [sample(DESIGN_CASE, npshaDesign), sample(AGED_CASE, npshaAged)],
  preferredRegions: [
    { name: 'candidate A', minFlow: 0.7 * 0.0804, maxFlow: 1.2 * 0.0804 },
    { name: 'candidate B', minFlow: 0.7 * 0.1053, maxFlow: 1.2 * 0.1053 },
  ],
  points: [
    { name: `candidate A / ${DESIGN_CASE}`, flow: 0.0782, head: 31.57 },
    { name: `candidate A / ${AGED_CASE}`, flow: 0.06892, head: 34.34 },
    { name: `candidate B / ${DESIGN_CASE}`, flow: 0.075, head: 30 },
  ],
};

/** The whole invented report (SI numbers, printed in SI by default). */
export const REPORT: DesignReport = {
  name: 'Process cooling loop, invented test bay',
  units: 'si',
  dutyFlow: q(QD, 'm3/s'),
  fluid: FLUID,
  verdict: { candidates: 2, passing: 1, recommended: 'candidate A', passed: true },
  inputs: { runs: [], pumpLocation: undefined, profile: [], energyPrice: undefined },
  atmosphere: q(101.325, 'kPa'),
  duty,
  candidates: [candidateA, candidateB],
  checks: [
    {
      id: 'suction-velocity',
      severity: 'warning',
      candidate: undefined,
      case: AGED_CASE,
      message: 'Suction velocity 2.6 m/s is above the usual range (up to 2.4 m/s).',
      values: { velocity: 2.6, max: 2.4 },
      source: 'common practice',
      words: {},
    },
  ],
  cautions: [
    'Check that the shut-off head of every candidate stays within the pressure rating of the discharge piping.',
    'Keep the suction line full and free of air; NPSH margins assume clean, cold-start conditions as given.',
    'Results support, and do not replace, licensed engineering judgement and local codes.',
  ],
  passed: false,
  curves: CURVES,
};
