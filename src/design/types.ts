/**
 * The shapes of a design evaluation: what goes in (the system, its operating cases, the duty,
 * the candidate pumps, the duty profile and the price of energy) and the report that comes out.
 *
 * @module
 */

import type { Fluid } from '../fluids/index';
import type { LinkState, NetworkCase, NetworkDefinition } from '../network/index';
import type {
  CataloguePoint,
  FitReport,
  MotorRating,
  MotorSeries,
  ProfileRow,
  PumpCurve,
} from '../pumps/index';
import type { OperatingCase, RunDetails, SystemDefinition } from '../system/index';
import type {
  Density,
  Flow,
  KinematicViscosity,
  Length,
  Power,
  Pressure,
  RotationalSpeed,
  Temperature,
  Time,
  UnitOf,
  Velocity,
} from '../units/index';

/** How several identical pumps of a candidate are connected. */
export type Arrangement = 'single' | 'parallel' | 'series';

/**
 * How a candidate meets the duty: `'fixed'` runs at full speed (a valve throttles it to the
 * duty flow when the profile asks for less), `'speed'` has a variable-speed drive that turns
 * it down to each required flow.
 */
export type SpeedControl = 'fixed' | 'speed';

/** A candidate pump set. */
export interface CandidateInput {
  /** Name for reports; unique among candidates. */
  readonly name: string;
  /** The pump's curve at its rated speed (from `pumpCurve`); it needs efficiency data. */
  readonly pump: PumpCurve;
  /** Number of identical pumps running together (default 1). */
  readonly count?: number;
  /** How they are connected when `count` > 1 (default `'parallel'`). */
  readonly arrangement?: Arrangement;
  /** Fixed speed or variable-speed drive (default `'fixed'`). */
  readonly control?: SpeedControl;
  /** Highest speed the drive may run at (speed control); default the curve's speed. */
  readonly maxSpeed?: RotationalSpeed;
  /** Motor efficiency, (0, 1]. */
  readonly motorEfficiency: number;
  /** Drive efficiency, (0, 1]; default 1 for fixed speed, and it should be given for a drive. */
  readonly driveEfficiency?: number;
  /** Motor rating series for the selection (default `'iec'`). */
  readonly motorSeries?: MotorSeries;
  /** Service factor the motor selection may rely on (default 1.0: none). */
  readonly serviceFactor?: number;
  /** An installed or proposed motor rating per pump, checked for overload when given. */
  readonly motorRating?: Power;
}

/** Where the pump sits, for the NPSH available and the suction/discharge velocity checks. */
export interface PumpLocation {
  /** Elevation of the impeller eye (the NPSH datum), on the system's elevation datum. */
  readonly elevation: Length;
  /**
   * How many of the system's first line elements are the suction line (upstream of the pump);
   * they must be runs, not parallel groups. Default 1.
   */
  readonly suctionRuns?: number;
}

/** Limits and choices for the checks; every one has a documented default. */
export interface DesignLimits {
  /**
   * NPSH margin ratio NPSHa / NPSHr the design must keep (default 1.1; ANSI/HI 9.6.1 gives
   * ratios by application: see the pumps module's `npshMargin`).
   */
  readonly npshMarginRatio?: number;
  /** Smallest NPSHa - NPSHr difference the design must keep (default 0.6 m; see `npshMargin`). */
  readonly npshMinimumMargin?: Length;
  /** Absolute design pressure of the discharge piping, to check the shut-off pressure. */
  readonly designPressure?: Pressure;
  /** Usual suction-line velocity range (default 0.5 to 1.5 m/s, common practice). */
  readonly suctionVelocity?: { readonly min: Velocity; readonly max: Velocity };
  /** Usual discharge-line velocity range (default 1 to 3 m/s, common practice). */
  readonly dischargeVelocity?: { readonly min: Velocity; readonly max: Velocity };
  /** Vapour pressure / suction surface pressure above which the fluid is "near boiling" (default 0.8). */
  readonly nearBoilingRatio?: number;
  /**
   * How far a fixed-speed set may fall short of the duty flow and still pass, as a fraction
   * of the duty flow, 0 to 1 (default 0.02, that is 2 %). Any shortfall is reported as a note
   * with its percentage; beyond this tolerance it is an error. The default allows for the
   * uncertainty of the system curve (friction factors and fitting K values are known to a few
   * per cent, and the flow of a friction-dominated system moves by about half the head error)
   * and lies well inside the flow tolerance a pump's own acceptance test admits (ISO 9906 /
   * ANSI/HI 14.6 grade 1B: +-5 % of flow; from memory). Set 0 to fail any shortfall.
   */
  readonly dutyFlowTolerance?: number;
}

/**
 * Inputs of the surge screening (check `surge`): giving this block asks for the check. The
 * check also needs `pumpLocation`, the fluid's bulk modulus and, for the up-surge, the design
 * pressure (`limits.designPressure`).
 */
export interface SurgeInput {
  /**
   * Effective time over which the flow stops on a pump trip or a valve closure (s), >= 0;
   * default 0 (sudden: the full Joukowsky rise).
   */
  readonly closureTime?: Time;
}

/** Inputs of the low-flow heating check (`low-flow-heating`): giving this block asks for it. */
export interface LowFlowInput {
  /**
   * Lowest flow one pump may run at (the minimum continuous flow the file states); default the
   * low end of the pump's allowable region, or of its curve.
   */
  readonly minimumFlow?: Flow;
  /** Largest temperature rise through the pump to accept (K), > 0; default 8 K. */
  readonly maxTemperatureRise?: number;
}

/**
 * The suction inlet in a free-surface intake (check `intake-submergence`): giving both asks
 * for the check. The suction end must be a free surface (no `velocityDiameter`).
 */
export interface IntakeInput {
  /** Depth of the inlet face below the suction surface in the design case (m), > 0. */
  readonly depth?: Length;
  /** Inlet (bell) diameter (m), > 0. */
  readonly diameter?: Length;
}

/** Units a report is written in. */
export type UnitSystem = 'si' | 'us';

/** The whole design problem. */
export interface DesignInput {
  /** Name for the report. */
  readonly name: string;
  /** The system (fluid state, endpoints, line) in its design case. */
  readonly system: SystemDefinition;
  /** Name of the liquid for the report (for example `'water'`); default `'liquid'`. */
  readonly fluidName?: string;
  /** Operating cases; with none, the design case alone is evaluated. */
  readonly cases?: readonly OperatingCase[];
  /** The flow the pumps must deliver. */
  readonly dutyFlow: Flow;
  /** Where the pump sits (needed for NPSH available and the velocity checks). */
  readonly pumpLocation?: PumpLocation;
  /** Candidate pump sets; with none, the report gives the duty only. */
  readonly candidates?: readonly CandidateInput[];
  /** Hours a year at each flow (default: the duty flow for 8760 h). */
  readonly profile?: readonly ProfileRow[];
  /** Price of energy, for the yearly cost. */
  readonly energyPrice?: { readonly perKWh: number; readonly currency: string };
  /** Check limits. */
  readonly limits?: DesignLimits;
  /** Units for the report's text (default `'si'`); the report's numbers are SI either way. */
  readonly units?: UnitSystem;
  /**
   * Atmospheric pressure at the site (absolute; default the standard atmosphere, 101 325 Pa;
   * `atmosphereAt(elevation)` gives it for a site's elevation). The ends' pressures in
   * `system` are absolute already: the report uses this to show each one as gauge too.
   */
  readonly atmosphere?: Pressure;
  /** The liquid itself (its states at other temperatures), for the saturation margin. */
  readonly liquid?: Fluid;
  /** Surge screening on pump trip or valve closure (check `surge`). */
  readonly surge?: SurgeInput;
  /** Heat at the lowest flow (check `low-flow-heating`). */
  readonly lowFlow?: LowFlowInput;
  /** The suction inlet of a free-surface intake (check `intake-submergence`). */
  readonly intake?: IntakeInput;
}

/** A minimum pressure at a node of a network (absolute; a scenario file gives it as gauge). */
export interface ServicePressure {
  readonly node: string;
  /** The lowest absolute pressure the node may have. */
  readonly minPressure: Pressure;
}

/**
 * The whole problem on a network: the network in its design case, the link where the
 * candidate pumps go, the operating cases, and the duty, which is either a flow through the
 * pump link (`dutyFlow`) or service pressures (`service`): the least pump head that gives every
 * listed node at least its minimum pressure. Everything else is as {@link DesignInput}.
 */
export interface NetworkDesignInput {
  readonly name: string;
  /** The network in its design case. */
  readonly network: NetworkDefinition;
  /**
   * Id of the link where the candidate pumps go (from its `from` node, the suction, to its `to`
   * node, the discharge). It may be a pump link (its curve is replaced by each candidate's) or
   * any other link (replaced by the pump).
   */
  readonly pumpLink: string;
  /** Elevation of the impeller eye, for NPSH; default the suction node's elevation. */
  readonly pumpElevation?: Length;
  readonly fluidName?: string;
  /** Operating cases of the network; with none, the design case alone is evaluated. */
  readonly cases?: readonly NetworkCase[];
  /** A flow through the pump link (give this or `service`). */
  readonly dutyFlow?: Flow;
  /** Minimum pressures at nodes, the same in every case (give this or `dutyFlow`). */
  readonly service?: readonly ServicePressure[];
  readonly candidates?: readonly CandidateInput[];
  /** Hours a year at each flow (default: the design case's duty flow for 8760 h). */
  readonly profile?: readonly ProfileRow[];
  readonly energyPrice?: { readonly perKWh: number; readonly currency: string };
  /** Check limits (`designPressure` is checked at every node on the discharge side). */
  readonly limits?: DesignLimits;
  readonly units?: UnitSystem;
  /** Atmospheric pressure at the site (absolute); default the network's atmosphere. */
  readonly atmosphere?: Pressure;
  /** Where to draw each node in a schematic (any consistent units, y up), by node id. */
  readonly coordinates?: Readonly<Record<string, { readonly x: number; readonly y: number }>>;
}

/** A node of a network at a solution, for the report's node table (SI, pressures absolute). */
export interface NodeRow {
  readonly id: string;
  readonly kind: 'junction' | 'surface' | 'outlet';
  readonly elevation: Length;
  readonly head: Length;
  readonly pressure: Pressure;
  /** Flow leaving the network there (demand, outlet discharge, flow into a surface). */
  readonly outflow: Flow;
  /** The service minimum (absolute), when one is set. */
  readonly minPressure: Pressure | undefined;
  /** How far the pressure is below the minimum (Pa, > 0), when it is. */
  readonly shortfall: Pressure | undefined;
  readonly isolated: boolean;
}

/** A link of a network at a solution, for the report's link table (SI). */
export interface LinkRow {
  readonly id: string;
  readonly kind: 'run' | 'pump' | 'valve';
  readonly from: string;
  readonly to: string;
  readonly flow: Flow;
  readonly velocity: Velocity | undefined;
  /** Head at `from` minus head at `to` (negative across a running pump). */
  readonly headLoss: Length;
  readonly reynolds: number | undefined;
  readonly frictionFactor: number | undefined;
  readonly state: LinkState;
}

/** The network solved at one case's duty, for the node and link tables. */
export interface NetworkTables {
  /** Id of the pump link. */
  readonly pumpLink: string;
  /** How the duty was set: a flow through the pump link, or service pressures. */
  readonly duty: 'flow' | 'service';
  readonly nodes: readonly NodeRow[];
  readonly links: readonly LinkRow[];
  /** Linear solves of the network solution shown and its final residuals. */
  readonly iterations: number;
  readonly headResidual: number;
  readonly flowResidual: number;
  /** Solves the duty search made (flow duty or service duty). */
  readonly searchSolves: number;
}

/** How serious a check's finding is. `error` fails the candidate (or the design). */
export type Severity = 'error' | 'warning' | 'info';

/** One finding of a check. */
export interface Check {
  /** Stable id, for example `'npsh-margin'`, `'preferred-region'`, `'motor-overload'`. */
  readonly id: string;
  readonly severity: Severity;
  /** Candidate it concerns, if any. */
  readonly candidate: string | undefined;
  /** Operating case it concerns, if any. */
  readonly case: string | undefined;
  /**
   * Plain words: what was found and what to do, in the report's unit system. Renderers rebuild
   * it in the unit system they print in with `checkMessage(check, units)`, from `values` and
   * `words`.
   */
  readonly message: string;
  /** The numbers behind it, SI, by name (for example `{ npshAvailable: 4.1, npshRequired: 3.6 }`). */
  readonly values: Readonly<Record<string, number>>;
  /** The words behind it that are not numbers: a run's name, a line's side, a reason. */
  readonly words: Readonly<Record<string, string>>;
  /** The standard, publication or 'common practice' the limit comes from. */
  readonly source: string;
}

/** The liquid in one operating case. */
export interface ReportFluid {
  /** As the input names it (`'water'`), or `'liquid'`. */
  readonly name: string;
  readonly temperature: Temperature;
  readonly density: Density;
  readonly kinematicViscosity: KinematicViscosity;
  /** Absolute vapour pressure, when known. */
  readonly vaporPressure: Pressure | undefined;
}

/**
 * The NPSH available at the duty flow in its terms (all heads of the liquid, m):
 * `total = surfacePressureHead - vaporPressureHead + staticHeight - suctionLoss + velocityHead`.
 */
export interface NpshTerms {
  /** Absolute pressure on the suction surface as a head, p_s / (rho g). */
  readonly surfacePressureHead: Length;
  /** Vapour pressure as a head, p_v / (rho g). */
  readonly vaporPressureHead: Length;
  /** Suction surface above the impeller eye (negative: a suction lift). */
  readonly staticHeight: Length;
  /** Losses of the suction runs. */
  readonly suctionLoss: Length;
  /** Velocity head of the suction end (0 for a still surface). */
  readonly velocityHead: Length;
  readonly total: Length;
}

/** The duty in one operating case. */
export interface CaseDuty {
  readonly case: string;
  /** The liquid in this case. */
  readonly fluid: ReportFluid;
  /** Whether the runs use their aged roughness in this case. */
  readonly aged: boolean;
  /** Elevation of the suction end (a surface or point) in this case. */
  readonly suctionElevation: Length;
  /** Elevation of the discharge end in this case. */
  readonly dischargeElevation: Length;
  /** NPSH available at the duty flow in its terms, when it can be known. */
  readonly npshTerms: NpshTerms | undefined;
  /**
   * Absolute static pressure in the line just after the pump at the duty flow (at the pump's
   * elevation; velocity head of the first discharge run taken off), when the pump location
   * is known.
   */
  readonly pumpDischargePressure: Pressure | undefined;
  /** Head the pumps must add at the duty flow. */
  readonly head: Length;
  readonly staticHead: Length;
  readonly lossHead: Length;
  /** NPSH available at the duty flow, when the pump location and a vapour pressure are known. */
  readonly npshAvailable: Length | undefined;
  /** Absolute pressure at the suction end in this case (gauge: minus the report's `atmosphere`). */
  readonly suctionPressure: Pressure;
  /** Absolute pressure at the discharge end in this case. */
  readonly dischargePressure: Pressure;
  /** Every run's figures at the duty flow. */
  readonly runs: readonly RunDetails[];
  /**
   * On a network: the duty flow of this case (the flow through the pump link at the duty
   * head; with service pressures it changes from case to case), and the whole network solved
   * at the duty (node and link tables).
   */
  readonly network?: { readonly dutyFlow: Flow; readonly tables: NetworkTables };
}

/** Where a candidate runs in one operating case. */
export interface CaseResult {
  readonly case: string;
  /** Why there is no operating point (the pump cannot reach the system ...), or undefined. */
  readonly failure: string | undefined;
  /** Speed it runs at (full speed, or what the drive needs for the duty flow). */
  readonly speed: RotationalSpeed | undefined;
  readonly flow: Flow | undefined;
  readonly head: Length | undefined;
  readonly efficiency: number | undefined;
  /** Shaft power of the whole set. */
  readonly shaftPower: Power | undefined;
  /** Flow of one pump as % of its BEP flow (at the speed it runs at). */
  readonly percentOfBep: number | undefined;
  readonly region: 'preferred' | 'allowable' | 'outside' | undefined;
  readonly npshAvailable: Length | undefined;
  readonly npshRequired: Length | undefined;
  /** NPSHa / NPSHr. */
  readonly npshRatio: number | undefined;
  /** Velocity in each run at this flow. */
  readonly velocities: readonly { readonly run: string; readonly velocity: Velocity }[];
  /** Electrical input power of the whole set (shaft power / (motor x drive efficiency)). */
  readonly inputPower: Power | undefined;
  /** Electrical energy per volume pumped in this case, J/m3 (input power / flow). */
  readonly specificEnergy: number | undefined;
  /** Root-finder iterations for the operating point (and the speed, under speed control). */
  readonly iterations: number;
  /** On a network: the whole network at this operating point (node and link tables). */
  readonly network?: NetworkTables;
}

/** A candidate's evaluation. */
export interface CandidateReport {
  readonly name: string;
  readonly count: number;
  readonly arrangement: Arrangement;
  readonly control: SpeedControl;
  readonly cases: readonly CaseResult[];
  /** Largest shaft power of one pump over its allowed flow range at its highest speed. */
  readonly maxShaftPower: Power | undefined;
  /** Smallest standard motor per pump that never overloads over the curve. */
  readonly motor: MotorRating | undefined;
  /** Smallest standard motor per pump that covers the duty points only. */
  readonly dutyOnlyMotor: MotorRating | undefined;
  /**
   * Yearly energy and cost of the whole set over the profile, design case; `control` says how
   * it meets each profile flow: `'throttle'` (full speed, a valve throttles it to the flow) or
   * `'speed'` (a drive turns it down to the flow); `hours` is the profile's total.
   */
  readonly energy:
    | {
        readonly kWh: number;
        readonly cost: { readonly amount: number; readonly currency: string } | undefined;
        readonly control: 'throttle' | 'speed';
        readonly hours: number;
      }
    | undefined;
  /** The pump as given: catalogue points and speed, the drive's top speed, efficiencies. */
  readonly pump: CandidatePump;
  /**
   * How the pump's head and efficiency curves fit its catalogue points (at the catalogue speed
   * and diameter): method, degree, default or given, largest residual and whether it lies
   * within the catalogue tolerance (head 0.5 %, efficiency 0.5 percentage point).
   */
  readonly curveFit: { readonly head: FitReport; readonly efficiency: FitReport | undefined };
  /** Checks of this candidate. */
  readonly checks: readonly Check[];
  /** True when no check of this candidate is an error. */
  readonly passed: boolean;
  /** 1-based rank among candidates (passing ones first, then by yearly energy). */
  readonly rank: number;
}

/** A candidate's pump as given, restated in the report. */
export interface CandidatePump {
  /** The catalogue points, at `ratedSpeed`. */
  readonly points: readonly CataloguePoint[];
  readonly ratedSpeed: RotationalSpeed;
  /** The speed the curve was given at (after any speed change by the caller). */
  readonly speed: RotationalSpeed;
  /** Highest speed it runs at (the drive's limit under speed control). */
  readonly maxSpeed: RotationalSpeed;
  readonly motorEfficiency: number;
  readonly driveEfficiency: number | undefined;
  readonly motorSeries: MotorSeries;
  /** Best efficiency point of one pump at `speed`, when efficiency is known. */
  readonly bep:
    | { readonly flow: Flow; readonly head: Length; readonly efficiency: number }
    | undefined;
}

/** One fitting line of a run, restated. */
export interface RunFitting {
  readonly id: string;
  readonly description: string;
  readonly count: number;
  /** K of one such fitting at the design case's duty (Reynolds number and diameter of the run). */
  readonly k: number;
  readonly source: string;
}

/** A run as given, restated in the report (figures in the design case). */
export interface RunInputSummary {
  readonly name: string;
  /** Branch path for runs in a parallel group. */
  readonly group: string | undefined;
  /** Nominal size and wall (`'NPS 6 sch 40'`), when the run names a catalogue pipe. */
  readonly size: string | undefined;
  readonly insideDiameter: Length;
  readonly length: Length;
  readonly material: string | undefined;
  /** Roughness of new pipe used, and of aged pipe where one is known. */
  readonly roughness: Length | undefined;
  readonly agedRoughness: Length | undefined;
  readonly fittings: readonly RunFitting[];
  /** Valves given by a flow coefficient: the coefficient as given and the K it makes. */
  readonly valves: readonly {
    readonly name: string;
    readonly given: 'cv' | 'kv' | 'k';
    readonly coefficient: number;
    readonly k: number;
  }[];
  /** Equipment with its loss at the design case's duty. */
  readonly equipment: readonly { readonly name: string; readonly loss: Length }[];
  readonly elevationChange: Length | undefined;
}

/** The verdict of a report: how many candidates pass and which one is recommended. */
export interface Verdict {
  readonly candidates: number;
  readonly passing: number;
  /** The first-ranked candidate, when there is one. */
  readonly recommended: string | undefined;
  /** True when the recommended candidate passes every check and no system check is an error. */
  readonly passed: boolean;
}

/** A curve sampled for charts: `values[i]` at `flows[i]` (SI: m3/s and m, or a fraction). */
export interface SampledCurve {
  readonly name: string;
  /** The candidate (set) a pump-side curve belongs to, so a chart can colour it alike. */
  readonly group?: string;
  /** For a pump curve: the speed it is drawn at (rad/s). */
  readonly speed?: number;
  /** For a pump curve: whether that is the highest speed the set may run at. */
  readonly maxSpeed?: boolean;
  readonly flows: readonly number[];
  readonly values: readonly number[];
}

/** The curves behind a report, sampled for charts (SI). */
export interface ReportCurves {
  /** System head per operating case. */
  readonly systems: readonly SampledCurve[];
  /** Head of each candidate set at each speed it runs at. */
  readonly pumps: readonly SampledCurve[];
  /** Efficiency of each candidate set at full speed (fraction). */
  readonly efficiency: readonly SampledCurve[];
  /** NPSH required of each candidate set at full speed (m). */
  readonly npshRequired: readonly SampledCurve[];
  /** NPSH available per operating case (m), where it is known. */
  readonly npshAvailable: readonly SampledCurve[];
  /** Preferred operating region of each candidate set (flows of the set, m3/s). */
  readonly preferredRegions: readonly {
    readonly name: string;
    readonly group?: string;
    readonly minFlow: number;
    readonly maxFlow: number;
  }[];
  /** Operating point of each candidate in each case. */
  readonly points: readonly {
    readonly name: string;
    readonly candidate?: string;
    readonly case?: string;
    readonly flow: number;
    readonly head: number;
  }[];
  /** The duty point (duty flow, head the system needs) of each case. */
  readonly dutyPoints?: readonly {
    readonly case: string;
    readonly flow: number;
    readonly head: number;
  }[];
}

/** Options of `evaluateDesign`. */
export interface EvaluateOptions {
  /**
   * Sample the curves a chart draws (`report.curves`); default false. Sampling takes a third
   * of the evaluation's time, so ask for it only when a chart is wanted.
   */
  readonly curves?: boolean;
}

/** What a report restates of its input. */
export interface ReportInputs {
  /** Every run, in flow order (parallel branches flattened). */
  readonly runs: readonly RunInputSummary[];
  /** Elevation of the impeller eye and how many runs are the suction line, when given. */
  readonly pumpLocation: { readonly elevation: Length; readonly suctionRuns: number } | undefined;
  /** Hours a year at each flow. */
  readonly profile: readonly ProfileRow[];
  readonly energyPrice: { readonly perKWh: number; readonly currency: string } | undefined;
}

/** The report of a design evaluation. All numbers are SI; `units` says how to print them. */
export interface DesignReport {
  readonly name: string;
  readonly units: UnitSystem;
  readonly dutyFlow: Flow;
  /** The liquid in the design case. */
  readonly fluid: ReportFluid;
  /** How many candidates pass and which one is recommended. */
  readonly verdict: Verdict;
  /** The input restated: runs, pump location, duty profile, price of energy. */
  readonly inputs: ReportInputs;
  /** Atmospheric pressure at the site (absolute), against which the ends' gauge pressures are shown. */
  readonly atmosphere: Pressure;
  /** The duty in each operating case. */
  readonly duty: readonly CaseDuty[];
  /** Candidates, in rank order. */
  readonly candidates: readonly CandidateReport[];
  /** Checks that concern the system rather than a candidate. */
  readonly checks: readonly Check[];
  /** The usual engineering cautions; always present. */
  readonly cautions: readonly string[];
  /**
   * True when the recommended (first-ranked) candidate passes every check and no system check
   * is an error (with no candidates: no system check is an error). Other candidates may fail.
   */
  readonly passed: boolean;
  /** Curves for charts, when asked for (`evaluateDesign(input, { curves: true })`). */
  readonly curves: ReportCurves | undefined;
  /**
   * On a network: the layout (nodes with any coordinates the input gives, links with their
   * ends), the pump link and the service pressures; absent for a line.
   */
  readonly network?: NetworkLayout;
}

/** A network's layout, restated in a report. */
export interface NetworkLayout {
  readonly pumpLink: string;
  readonly nodes: readonly {
    readonly id: string;
    readonly kind: 'junction' | 'surface' | 'outlet';
    readonly elevation: Length;
    readonly x?: number;
    readonly y?: number;
  }[];
  readonly links: readonly {
    readonly id: string;
    readonly kind: 'run' | 'pump' | 'valve';
    readonly from: string;
    readonly to: string;
  }[];
  readonly service: readonly ServicePressure[];
}

/** Display units of each unit system (for renderers and the CLI). */
export interface DisplayUnits {
  readonly flow: UnitOf<'flow'>;
  readonly head: UnitOf<'length'>;
  readonly pressure: UnitOf<'pressure'>;
  readonly power: UnitOf<'power'>;
  readonly velocity: UnitOf<'velocity'>;
  readonly speed: UnitOf<'rotationalSpeed'>;
  readonly length: UnitOf<'length'>;
}
