/**
 * Pipe wall materials: equivalent sand-grain roughness and Hazen-Williams C, typed in from
 * the sources named in each row (values in the source's own unit). Not generated.
 *
 * Sources (short names used in the rows):
 * - MOODY-1944: L. F. Moody, "Friction factors for pipe flow", Transactions of the ASME 66
 *   (1944) 671-684, Fig. 1 (roughness in feet for new, clean pipe).
 * - HRW-TABLE-5: HR Wallingford and D. I. H. Barr, "Tables for the hydraulic design of pipes,
 *   sewers and channels" (Thomas Telford), the table of Colebrook-White roughness k_s by
 *   pipe material, columns Good (up to 20 years of use) / Normal (40 to 50 years) / Poor (80
 *   to 100 years), in mm. From memory: the values were read from a reproduction of the
 *   table; the edition, page and table number of the book were not in hand.
 * - FGO-5.1: N. K. Shammas and L. K. Wang, "Fair, Geyer, and Okun's Water and Wastewater
 *   Engineering: Water Supply and Wastewater Removal", 3rd ed., Wiley 2011, Table 5.1
 *   "Values of the Hazen-Williams coefficient C for different conduit materials and age of
 *   conduit" (columns New / Uncertain).
 * - WS-2.1: E. B. Wylie and V. L. Streeter, "Fluid Transients in Systems", Prentice Hall
 *   1993, Table 2.1 (modulus of elasticity E and Poisson's ratio of pipe materials; the
 *   figures are recalled from memory, not read from a copy in hand: check them against the
 *   table or the manufacturer before a design relies on them).
 * - NFPA-13: NFPA 13, "Standard for the Installation of Sprinkler Systems", the table of
 *   Hazen-Williams C values for the pipe materials of sprinkler systems (from memory: the
 *   edition and table number were not in hand).
 * - AWWA-M41: AWWA Manual M41, "Ductile-Iron Pipe and Fittings" (from memory).
 *
 * @module
 */

/** Names of the materials in the table. */
export type MaterialName =
  | 'commercial-steel'
  | 'galvanized-steel'
  | 'cast-iron'
  | 'ductile-iron-cement-lined'
  | 'copper'
  | 'pvc'
  | 'polyethylene'
  | 'concrete';

/** One material as typed in: lengths in `unit`. */
export interface MaterialRow {
  readonly name: MaterialName;
  readonly description: string;
  readonly unit: 'ft' | 'mm';
  /** Roughness of new, clean pipe in `unit`. */
  readonly roughness: number;
  /** Range for new pipe where the source prints a range, in `unit`. */
  readonly roughnessRange?: readonly [number, number];
  /** Range for aged pipe in mm, where a source gives one. */
  readonly agedRoughnessMm?: readonly [number, number];
  readonly hazenWilliamsC: number;
  readonly agedHazenWilliamsC?: number;
  /** Young's modulus of elasticity of the wall, GPa (a typical value for design). */
  readonly elasticModulusGPa: number;
  /** Range of E in GPa where the source prints one. */
  readonly elasticModulusRangeGPa?: readonly [number, number];
  /** Poisson's ratio of the wall. */
  readonly poissonRatio: number;
  readonly sources: readonly string[];
}

export const MATERIALS: readonly MaterialRow[] = [
  {
    name: 'commercial-steel',
    description: 'commercial (welded or seamless) carbon steel, unlined',
    unit: 'ft',
    roughness: 0.00015,
    agedRoughnessMm: [0.15, 0.3],
    hazenWilliamsC: 140,
    agedHazenWilliamsC: 100,
    elasticModulusGPa: 207,
    elasticModulusRangeGPa: [200, 212],
    poissonRatio: 0.3,
    sources: [
      "roughness: MOODY-1944 Fig. 1, 'commercial steel or wrought iron' 0.00015 ft",
      "aged roughness: HRW-TABLE-5 'Rusty steel', Normal 0.15 mm to Poor 0.3 mm",
      "C: FGO-5.1 'Steel, welded joints, coated', New 140, Uncertain age 100",
      "E and Poisson's ratio: WS-2.1 'Mild steel' E 200-212 GPa, Poisson 0.27-0.30 (from memory); 207 GPa (30 000 000 psi) is the common design value (common practice)",
    ],
  },
  {
    name: 'galvanized-steel',
    description: 'galvanised steel or iron',
    unit: 'ft',
    roughness: 0.0005,
    agedRoughnessMm: [0.15, 0.3],
    hazenWilliamsC: 120,
    elasticModulusGPa: 207,
    elasticModulusRangeGPa: [200, 212],
    poissonRatio: 0.3,
    sources: [
      "roughness: MOODY-1944 Fig. 1, 'galvanized iron' 0.0005 ft",
      "aged roughness: HRW-TABLE-5 'Galvanised iron, coated cast iron generally', Normal 0.15 mm to Poor 0.3 mm",
      "C: NFPA-13 'Galvanized (all)' 120 (from memory); water-supply handbooks print the same 120 for galvanized iron (from memory)",
      "E and Poisson's ratio: as commercial steel, WS-2.1 'Mild steel' (from memory); the zinc coat is too thin to matter",
    ],
  },
  {
    name: 'cast-iron',
    description: 'cast iron, unlined',
    unit: 'ft',
    roughness: 0.00085,
    agedRoughnessMm: [0.3, 0.6],
    hazenWilliamsC: 130,
    agedHazenWilliamsC: 100,
    elasticModulusGPa: 100,
    elasticModulusRangeGPa: [80, 170],
    poissonRatio: 0.25,
    sources: [
      "roughness: MOODY-1944 Fig. 1, 'cast iron' 0.00085 ft",
      "aged roughness: HRW-TABLE-5 'Uncoated cast iron', Normal 0.3 mm to Poor 0.6 mm (tuberculated mains can be far rougher: same table, 'Old tuberculated water mains')",
      "C: FGO-5.1 'Cast-iron pipe, coated', New 130, Uncertain age 100",
      "E and Poisson's ratio: WS-2.1 'Cast iron' E 80-170 GPa, Poisson 0.25 (from memory); 100 GPa is typical of grey iron (from memory)",
    ],
  },
  {
    name: 'ductile-iron-cement-lined',
    description: 'ductile iron with spun cement-mortar lining',
    unit: 'mm',
    roughness: 0.03,
    hazenWilliamsC: 140,
    elasticModulusGPa: 166,
    poissonRatio: 0.28,
    sources: [
      "roughness: HRW-TABLE-5 'Spun bitumen or concrete lined', Normal 0.03 mm (the only column printed)",
      "C: AWWA-M41 gives C = 140 for cement-mortar lined ductile iron (from memory); NFPA-13 'Cement-lined cast or ductile iron' 140 (from memory). FGO-5.1 prints 130 for cement-lined cast iron used with the nominal diameter",
      "E and Poisson's ratio: ductile iron E = 24 000 000 psi (166 GPa), Poisson 0.28, as AWWA M41 gives them (from memory); the cement lining is not counted",
    ],
  },
  {
    name: 'copper',
    description: 'copper, drawn tubing',
    unit: 'ft',
    roughness: 0.000005,
    hazenWilliamsC: 130,
    elasticModulusGPa: 117,
    elasticModulusRangeGPa: [107, 131],
    poissonRatio: 0.34,
    sources: [
      "roughness: MOODY-1944 Fig. 1, 'drawn tubing' 0.000005 ft",
      'C: 130, from memory: water-supply tables print 130 to 140 for copper (with brass, lead and tin); the table keeps the lower end (more head loss). NFPA-13 allows 150 for copper tube in sprinkler systems (from memory)',
      "E and Poisson's ratio: WS-2.1 'Copper' E 107-131 GPa, Poisson 0.34 (from memory)",
    ],
  },
  {
    name: 'pvc',
    description: 'PVC (unplasticised polyvinyl chloride)',
    unit: 'ft',
    roughness: 0.000005,
    hazenWilliamsC: 150,
    elasticModulusGPa: 2.75,
    elasticModulusRangeGPa: [2.4, 2.75],
    poissonRatio: 0.45,
    sources: [
      "roughness: MOODY-1944 Fig. 1, 'drawn tubing' 0.000005 ft (smooth plastic is taken as drawn tubing; common practice)",
      "C: NFPA-13 'Plastic (listed), all' 150 (from memory); FGO-5.1 prints 140 new, 130 uncertain age for 'Cement-asbestos and plastic pipe'",
      "E and Poisson's ratio: WS-2.1 'PVC, rigid' E 2.4-2.75 GPa (from memory); Poisson 0.45 (from memory); the upper E is kept (a faster wave, a higher surge)",
    ],
  },
  {
    name: 'polyethylene',
    description: 'polyethylene (PE, HDPE)',
    unit: 'ft',
    roughness: 0.000005,
    hazenWilliamsC: 140,
    elasticModulusGPa: 0.8,
    poissonRatio: 0.46,
    sources: [
      "roughness: MOODY-1944 Fig. 1, 'drawn tubing' 0.000005 ft (smooth plastic, as for pvc)",
      "C: 140, from memory (the value water-supply practice commonly uses for PE pipe; FGO-5.1 prints 140 new for 'Cement-asbestos and plastic pipe')",
      "E and Poisson's ratio: WS-2.1 'Polyethylene' E 0.8 GPa (from memory); Poisson 0.46 (from memory). PE is viscoelastic: its effective E falls with load time and temperature",
    ],
  },
  {
    name: 'concrete',
    description: 'concrete; roughness depends strongly on finish',
    unit: 'ft',
    roughness: 0.001,
    roughnessRange: [0.001, 0.01],
    hazenWilliamsC: 140,
    agedHazenWilliamsC: 130,
    elasticModulusGPa: 30,
    elasticModulusRangeGPa: [14, 30],
    poissonRatio: 0.15,
    sources: [
      "roughness: MOODY-1944 Fig. 1, 'concrete' 0.001 to 0.01 ft; the table keeps the smooth end as the single value and gives the range",
      "C: FGO-5.1 'Concrete', New 140, Uncertain age 130",
      "E and Poisson's ratio: WS-2.1 'Concrete' E 14-30 GPa, Poisson 0.1-0.15 (from memory); the upper E is kept (a faster wave, a higher surge)",
    ],
  },
];
