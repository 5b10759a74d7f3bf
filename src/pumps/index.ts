/**
 * Pumps: curves from catalogue points, best efficiency point and operating regions, affinity
 * laws, operating point on a system, pumps in parallel and series, speed for a duty, NPSH,
 * specific speed, the power chain, motor sizing and yearly energy; the viscosity correction
 * (ANSI/HI 9.6.7), the temperature rise at low flow and the intake submergence (ANSI/HI 9.8).
 *
 * @module pumps
 */
export { pumpsInParallel, pumpsInSeries } from './combine';
export {
  type AnnualEnergy,
  type AnnualEnergyInput,
  annualEnergy,
  type EnergyRow,
  type ProfileRow,
} from './energy';
export {
  IEC_60072_KW_RATINGS,
  type MotorForPump,
  type MotorForPumpInput,
  type MotorOptions,
  type MotorRating,
  type MotorSeries,
  motorForPump,
  NEMA_MG1_HP_RATINGS,
  selectMotor,
} from './motors';
export {
  type NpshAvailableInput,
  type NpshFromGaugeInput,
  type NpshMarginInput,
  type NpshMarginResult,
  npshAvailable,
  npshMargin,
} from './npsh';
export {
  type OperatingPoint,
  type OperatingPointOptions,
  operatingPoint,
} from './operating-point';
export { hydraulicPower, type PowerChain, type PowerChainInput, powerChain } from './power';
export {
  CATALOGUE_FIT_TOLERANCE,
  DEFAULT_PREFERRED_REGION,
  type PumpCurveInput,
  pumpCurve,
} from './pump-curve';
export {
  SPECIFIC_SPEED_US_PER_SI,
  type SpecificSpeedUnits,
  specificSpeed,
  suctionSpecificSpeed,
} from './specific-speed';
export {
  type SpeedForFlowOptions,
  type SpeedForFlowResult,
  speedForFlow,
} from './speed-for-flow';
export { minimumSubmergence, type Submergence, type SubmergenceInput } from './submergence';
export { temperatureRise } from './temperature-rise';
export type {
  BestEfficiencyPoint,
  CataloguePoint,
  CurveFit,
  FitReport,
  FlowRange,
  Pump,
  PumpCurve,
  PumpCurveFits,
  PumpShare,
  SystemCurveLike,
} from './types';
export {
  correctForViscosity,
  type ViscosityCorrection,
  type ViscosityCorrectionOptions,
} from './viscosity-correction';
export {
  VISCOSITY_B_MAX,
  VISCOSITY_NU_MAX,
  VISCOSITY_NU_WATER_LIKE,
  type ViscosityFactors,
  type ViscosityFactorsInput,
  type ViscosityFactorsOptions,
  viscosityCorrectionFactors,
} from './viscosity-factors';
