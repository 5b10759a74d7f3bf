/**
 * The shapes of a selection: the pump catalogue that goes in, and the ranked ways to meet the
 * duty that come out.
 *
 * @module
 */
import type { CandidateInput, CandidateReport, CaseDuty, Check } from '../design/index';
import type { PipeDimensions } from '../pipes/index';
import type { CataloguePoint, MotorRating, MotorSeries, PumpCurve } from '../pumps/index';
import type { Flow, Length, Power, RotationalSpeed } from '../units/index';

/** Catalogue points of a pump at one impeller diameter (at the pump's catalogue speed). */
export interface CatalogueCurve {
  /** Impeller diameter these points hold at. */
  readonly impellerDiameter: Length;
  /** At least 3 points, flows increasing, with efficiency (and NPSH required where known). */
  readonly points: readonly CataloguePoint[];
}

/** A variable-speed drive a pump may run on. */
export interface CatalogueDrive {
  /** Lowest speed the drive and pump allow. */
  readonly minSpeed: RotationalSpeed;
  /** Highest speed the drive and pump allow. */
  readonly maxSpeed: RotationalSpeed;
  /** Drive efficiency, (0, 1]; default 1 (no drive loss counted). */
  readonly efficiency?: number;
  /** Price of the drive, added to the pump's initial cost for the `'speed'` way. */
  readonly price?: number;
}

/** One pump of a catalogue. */
export interface CataloguePump {
  /** Name, unique in the catalogue (for example `'80-200 2p'`). */
  readonly name: string;
  /** Speed of the catalogue curves. */
  readonly speed: RotationalSpeed;
  /** The full (largest) impeller diameter: the diameter of `points`. */
  readonly impellerDiameter: Length;
  /** Catalogue points at `speed` and the full impeller, with efficiency. */
  readonly points: readonly CataloguePoint[];
  /**
   * Smallest impeller the pump may be trimmed to. Default: the full diameter (no trim). The
   * trim search never goes below the trim law's limit ({@link SelectOptions.lowestTrimRatio}).
   */
  readonly minImpellerDiameter?: Length;
  /**
   * Curves at smaller impeller diameters, when the maker publishes them: a trim between two
   * of them is interpolated between them rather than scaled by the trim law.
   */
  readonly curves?: readonly CatalogueCurve[];
  /**
   * Fixed motor speeds the pump may run at (each is a separate selection); default the
   * catalogue speed alone. Curves are scaled to each by the affinity laws.
   */
  readonly motorSpeeds?: readonly RotationalSpeed[];
  /** A variable-speed drive, when the pump may run on one (the `'speed'` way). */
  readonly drive?: CatalogueDrive;
  /** Motor efficiency, (0, 1]; default the catalogue's `motorEfficiency`. */
  readonly motorEfficiency?: number;
  /** Motor rating series (default `'iec'`). */
  readonly motorSeries?: MotorSeries;
  /** Price of the pump set (pump and motor), in the catalogue's currency. */
  readonly price?: number;
}

/** A pump catalogue. */
export interface PumpCatalogue {
  /** Name for reports. */
  readonly name?: string;
  /** Currency of the prices. */
  readonly currency?: string;
  /** Motor efficiency of pumps that do not give their own, (0, 1]. */
  readonly motorEfficiency?: number;
  /** The pumps, with unique names. */
  readonly pumps: readonly CataloguePump[];
}

/** How a selection meets the duty. */
export type SelectionMethod = 'throttle' | 'trim' | 'speed';

/** Costs and money terms of the life-cycle cost; every one defaults to zero. */
export interface SelectionCosts {
  /** Years of service over which costs are counted (default 20). */
  readonly years?: number;
  /** Discount rate a year, a fraction (default 0). */
  readonly discountRate?: number;
  /** Escalation of the energy price a year, a fraction (default 0). */
  readonly energyEscalation?: number;
  /** Escalation of the other yearly costs, a fraction (default 0). */
  readonly escalation?: number;
  /** Installation and commissioning, per pump set (default 0). */
  readonly installation?: number;
  /** Operation (supervision labour) a year (default 0). */
  readonly operationPerYear?: number;
  /** Maintenance and repair a year (default 0). */
  readonly maintenancePerYear?: number;
  /** Downtime (lost production) a year (default 0). */
  readonly downtimePerYear?: number;
  /** Environmental costs a year (default 0). */
  readonly environmentalPerYear?: number;
  /** Decommissioning and disposal at the end of the life (default 0). */
  readonly decommissioning?: number;
  /** Cost of trimming an impeller, added to a trim's initial cost (default 0). */
  readonly trim?: number;
}

/** Options of `selectPumps`. */
export interface SelectOptions {
  /** The ways to consider (default all three). */
  readonly methods?: readonly SelectionMethod[];
  /** Costs for the life-cycle cost; when given (or a pump has a price), ranking is by it. */
  readonly costs?: SelectionCosts;
  /** Price of energy; default the design's `energyPrice`. */
  readonly energyPrice?: { readonly perKWh: number; readonly currency: string };
  /**
   * Smallest impeller, as a fraction of the full diameter, that the trim law may scale to
   * (default 0.75; common practice). Catalogue curves at smaller diameters extend it.
   */
  readonly lowestTrimRatio?: number;
  /**
   * Trim ratio below which a trim scaled by the law (not interpolated between catalogue
   * curves) is flagged as approximate (default 0.9; common practice).
   */
  readonly trimLawAccurateRatio?: number;
}

/** Present values of the life-cycle cost components (currency of the prices). */
export interface LifeCycleCost {
  /** The sum: initial + installation + energy + operation + maintenance + downtime + environmental + decommissioning. */
  readonly total: number;
  readonly initial: number;
  readonly installation: number;
  readonly energy: number;
  readonly operation: number;
  readonly maintenance: number;
  readonly downtime: number;
  readonly environmental: number;
  readonly decommissioning: number;
}

/** A selection in one operating case. */
export interface SelectionCase {
  readonly case: string;
  /** Why there is no operating point, or undefined. */
  readonly failure: string | undefined;
  /** Speed the pump runs at in this case. */
  readonly speed: RotationalSpeed | undefined;
  /** Where it runs without a valve (speed control: the duty flow). */
  readonly flow: Flow | undefined;
  readonly head: Length | undefined;
  readonly efficiency: number | undefined;
  readonly percentOfBep: number | undefined;
  /** NPSH available minus NPSH required at the operating point. */
  readonly npshMargin: Length | undefined;
  readonly npshRatio: number | undefined;
  /** Head a valve must burn to hold the duty flow: pump head minus system head there (0 with a drive). */
  readonly throttleHead: Length | undefined;
  /** Hydraulic power burnt in that valve, rho g Q dH. */
  readonly throttlePower: Power | undefined;
  /** Electrical input power at the duty flow (shaft / (motor x drive efficiency)). */
  readonly inputPower: Power | undefined;
  /**
   * Energy of a year over the duty profile were the system in this case all year (kWh), and
   * its cost at the energy price; undefined when the profile cannot be met in this case.
   */
  readonly energy:
    | {
        readonly kWh: number;
        readonly cost: { readonly amount: number; readonly currency: string } | undefined;
      }
    | undefined;
}

/** One way to meet the duty with one catalogue pump. */
export interface SelectionEntry {
  /** 1-based rank. */
  readonly rank: number;
  /** The catalogue pump's name. */
  readonly name: string;
  /** The way: full impeller throttled, trimmed impeller, or a drive. */
  readonly method: SelectionMethod;
  /** Name with the way, for reports: `'80-200 2p, trimmed to 192 mm'`. */
  readonly label: string;
  /** The pump as it will run: at its motor speed, trimmed; for a drive the full curve. */
  readonly curve: PumpCurve;
  /** The trimmed impeller diameter (`'trim'`), else undefined. */
  readonly trimDiameter: Length | undefined;
  /** Trim diameter as a fraction of the full impeller (`'trim'`), else undefined. */
  readonly trimRatio: number | undefined;
  /** `'trim'`: Brent iterations of the trim search over all cases (bounded by 200 a case). */
  readonly trimIterations: number | undefined;
  /** `'trim'`: how the curve was found (the trim law, or between catalogue curves). */
  readonly trimBasis: 'trim law' | 'interpolated' | 'catalogue curve' | undefined;
  /** Motor speed (`'throttle'`, `'trim'`) or the highest speed the drive needs (`'speed'`). */
  readonly speed: RotationalSpeed | undefined;
  /** True when no check is an error. */
  readonly passed: boolean;
  /** Every check of the design evaluation, and those of the selection. */
  readonly checks: readonly Check[];
  readonly cases: readonly SelectionCase[];
  /** Motor that never overloads. */
  readonly motor: MotorRating | undefined;
  /** Yearly energy and cost over the duty profile, design case. */
  readonly energy:
    | {
        readonly kWh: number;
        readonly cost: { readonly amount: number; readonly currency: string } | undefined;
      }
    | undefined;
  /** Life-cycle cost (present values), or undefined when the energy could not be found. */
  readonly lifeCycleCost: LifeCycleCost | undefined;
  /** The full evaluation of this way by `evaluateDesign`. */
  readonly report: CandidateReport;
  /** The candidate this way is for `evaluateDesign` (to evaluate or chart it again). */
  readonly candidate: CandidateInput;
}

/** The result of `selectPumps`. */
export interface Selection {
  /** The design's name. */
  readonly name: string;
  /** The catalogue's name, when it has one. */
  readonly catalogue: string | undefined;
  /** The duty flow. */
  readonly dutyFlow: Flow;
  /** The duty in each operating case. */
  readonly duty: readonly CaseDuty[];
  /** The usual engineering cautions. */
  readonly cautions: readonly string[];
  /** The money terms of the life-cycle cost as used (years, rates), when ranked by it. */
  readonly costs: SelectionCosts | undefined;
  /** Every way for every pump; passing entries first, then by `rankedBy`. */
  readonly ranked: readonly SelectionEntry[];
  /** What orders the passing (and the failing) entries. */
  readonly rankedBy: 'life-cycle cost' | 'energy';
  /** Currency of costs, when known. */
  readonly currency: string | undefined;
  /** Checks of the system (the same in every entry's evaluation). */
  readonly systemChecks: readonly Check[];
  /** Notes on the ranking (for example: no energy price, so energy is not costed). */
  readonly notes: readonly string[];
}

/** A candidate size of a pipe run, with its installed cost. */
export interface PipeSizeOption {
  /** The pipe (for example `pipeSize('6', '40')`). */
  readonly pipe: PipeDimensions;
  /** Installed cost per metre of run, in the catalogue's currency. */
  readonly costPerLength: number;
}

/** The candidate sizes of one run. */
export interface RunSizes {
  /** Name of a run of the design's line (not inside a parallel group). */
  readonly run: string;
  readonly sizes: readonly PipeSizeOption[];
}

/** Options of `economicPipeSize`. */
export interface PipeSizeOptions extends SelectOptions {
  /** The runs whose size is to be chosen, with their candidate sizes. */
  readonly runs: readonly RunSizes[];
  /**
   * Most combinations to enumerate exhaustively (default 64); beyond it the search is
   * coordinate descent from the smallest sizes.
   */
  readonly maxCombinations?: number;
}

/** One combination of pipe sizes and its best pump. */
export interface PipeSizeRow {
  /** Size of each run, in the order of `options.runs`: nominal size and schedule. */
  readonly sizes: readonly {
    readonly run: string;
    readonly nps: string;
    readonly schedule: string;
  }[];
  /** Installed cost of the pipe of these runs. */
  readonly pipeCost: number;
  /** The best passing selection with these sizes, or undefined when none passes. */
  readonly best: SelectionEntry | undefined;
  /** Pipe cost + the best selection's life-cycle cost, or undefined when none passes. */
  readonly lifeCycleCost: number | undefined;
}

/** Result of `economicPipeSize`. */
export interface PipeSizeResult {
  /** The combination of least life-cycle cost, or undefined when none passes. */
  readonly best: PipeSizeRow | undefined;
  /** Every combination evaluated, in the order evaluated. */
  readonly table: readonly PipeSizeRow[];
  /** How the combinations were searched. */
  readonly search: 'exhaustive' | 'coordinate descent';
  /** Combinations evaluated. */
  readonly evaluations: number;
}
