/**
 * The cautions every design report carries, whatever its checks found. Wording of our own;
 * the hazards are the usual ones of pumping systems (common practice).
 *
 * @module
 */

/** The usual engineering cautions, always printed with a report. */
export const CAUTIONS: readonly string[] = Object.freeze([
  'These results support, and do not replace, the judgement of a licensed engineer and the codes and standards that apply where the system is built.',
  'Pressure: every pipe, fitting, valve and vessel on the discharge side must be rated for the highest pressure the pump can make (its shut-off head at the highest speed and the highest suction pressure), or be protected by a relief device.',
  'Closed discharge: a pump running against a closed valve heats the liquid quickly and can fail violently; fit a minimum-flow bypass, a low-flow trip or interlocks.',
  'Hot liquids: hot water and other hot liquids scald and can flash to vapour when pressure falls; check NPSH at the hottest case and protect people from hot surfaces and releases.',
  'Cavitation: NPSH required from a catalogue is the NPSH3 at which the pump already cavitates; keep the margin your application needs and confirm NPSH3 with the manufacturer.',
  'Motors: a motor sized only for the duty point can overload when the pump runs out along its curve; check the nameplate, the service factor and the protection settings.',
  "Data: catalogue curves carry tolerances (for example ISO 9906 acceptance grades); confirm the selected pump against the manufacturer's certified curves before purchase.",
]);
