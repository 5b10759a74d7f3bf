/**
 * The spellings engineers write besides the catalogue's symbols (`gpm`, `m3/hr`, `feet`,
 * `deg F` ...), the gauge and absolute marks on pressure units (`psig`, `bara`, `kPa(g)`),
 * and the "did you mean" list for a spelling that is refused.
 *
 * @module
 */
import { UNITS, type UnitOf, type UnitSymbol } from './catalogue';
import type { Dimension } from './quantity';

/**
 * Other spellings of catalogue units, each mapped to one symbol. Text (files, forms,
 * `parseQuantity`, `convert`) may use them; `q` and `to` take the catalogue symbols, which
 * the type checker knows. `gpm` and `MGD` are US gallons (the catalogue's `gal`), `HP` the
 * mechanical horsepower (`hp`), `cfm` cubic feet per minute.
 */
export const UNIT_ALIASES = {
  // flow
  gpm: 'gal/min',
  GPM: 'gal/min',
  USgpm: 'gal/min',
  lpm: 'L/min',
  'l/s': 'L/s',
  'l/min': 'L/min',
  'l/h': 'L/h',
  'm3/hr': 'm3/h',
  'm³/hr': 'm3/h',
  cfm: 'ft3/min',
  MGD: 'Mgal/d',
  // rotational speed and power
  RPM: 'rpm',
  HP: 'hp',
  // length
  feet: 'ft',
  foot: 'ft',
  inch: 'in',
  inches: 'in',
  // temperature
  '°F': 'degF',
  '°C': 'degC',
  'deg F': 'degF',
  'deg C': 'degC',
} as const satisfies Record<string, UnitSymbol>;

/** An alias spelling. */
export type UnitAlias = keyof typeof UNIT_ALIASES;

/**
 * Spellings refused because they could mean units that differ: the message lists the
 * candidates ("did you mean ...").
 */
const AMBIGUOUS: Readonly<Record<string, readonly UnitSymbol[]>> = {
  deg: ['degC', 'degF', 'degR', 'K'],
  degree: ['degC', 'degF', 'degR', 'K'],
  degrees: ['degC', 'degF', 'degR', 'K'],
  '°': ['degC', 'degF', 'degR', 'K'],
  gallon: ['gal', 'impgal'],
  gallons: ['gal', 'impgal'],
  mgd: ['Mgal/d', 'ML/d'],
};

const hasOwn = Object.prototype.hasOwnProperty;

/** The catalogue symbol of an alias, or undefined. @internal */
export function aliasTarget(text: string): UnitSymbol | undefined {
  return hasOwn.call(UNIT_ALIASES, text) ? UNIT_ALIASES[text as UnitAlias] : undefined;
}

/** Pressure units that take a gauge or absolute mark (`psig`, `bar(a)` ...). */
const MARKABLE: readonly UnitSymbol[] = ['psi', 'bar', 'mbar', 'kPa', 'MPa'];

/** Whether a pressure was written as gauge or absolute. */
export type PressureReference = 'gauge' | 'absolute';

/**
 * Splits a pressure unit with a gauge or absolute mark: `psig`, `psia`, `barg`, `bara`,
 * `mbarg`, `kPag`, `kPaa`, `MPag`, and the same with the mark in brackets (`kPa(g)`,
 * `bar (a)`). Undefined for anything else. @internal
 */
export function markedPressure(
  text: string,
): { readonly symbol: UnitSymbol; readonly reference: PressureReference } | undefined {
  const m = /^(psi|bar|mbar|kPa|MPa)(?:([ga])|\s?\(([ga])\))$/.exec(text);
  if (m === null) return undefined;
  const symbol = m[1] as UnitSymbol;
  if (!MARKABLE.includes(symbol)) return undefined;
  return { symbol, reference: (m[2] ?? m[3]) === 'g' ? 'gauge' : 'absolute' };
}

function squash(text: string): string {
  return text.toLowerCase().replace(/\s+/g, '');
}

/**
 * Units a refused spelling may have meant: the candidates of an ambiguous spelling (`deg`,
 * `gallon`), or the symbols and aliases that differ from it only in letter case or spaces
 * (`KPA` -> `kPa`, `Mbar` -> `mbar`: symbols are case-sensitive because `mbar` and `Mbar`
 * differ a billionfold). Empty when nothing is near. @internal
 */
export function unitSuggestions(text: string): readonly string[] {
  const key = text.trim();
  if (hasOwn.call(AMBIGUOUS, key)) return AMBIGUOUS[key] ?? [];
  const folded = squash(key);
  if (folded === '') return [];
  const out = new Set<string>();
  for (const symbol of Object.keys(UNITS)) if (squash(symbol) === folded) out.add(symbol);
  for (const [alias, symbol] of Object.entries(UNIT_ALIASES)) {
    if (squash(alias) === folded) out.add(symbol);
  }
  for (const [spelling, candidates] of Object.entries(AMBIGUOUS)) {
    if (squash(spelling) === folded) for (const c of candidates) out.add(c);
  }
  for (const symbol of MARKABLE) {
    for (const mark of ['g', 'a']) {
      if (squash(`${symbol}${mark}`) === folded) out.add(`${symbol}${mark}`);
    }
  }
  return [...out];
}

/**
 * What to say about a refused unit spelling: `is ambiguous: did you mean degC, degF, degR or
 * K?`, `is not a known unit. Did you mean kPa?`, or `is not a known unit.` @internal
 */
export function refusedUnit(text: string): string {
  const s = unitSuggestions(text);
  if (s.length === 0) return 'is not a known unit.';
  const listed = s.length === 1 ? s[0] : `${s.slice(0, -1).join(', ')} or ${s[s.length - 1]}`;
  return hasOwn.call(AMBIGUOUS, text.trim())
    ? `is ambiguous: did you mean ${listed}?`
    : `is not a known unit. Did you mean ${listed}?`;
}

/** The aliases of a dimension's units, in catalogue order of the symbols. @internal */
export function aliasesOfDimension<D extends Dimension>(
  dimension: D,
): readonly { readonly alias: string; readonly unit: UnitOf<D> }[] {
  const symbols = Object.keys(UNITS) as UnitSymbol[];
  return (Object.entries(UNIT_ALIASES) as [string, UnitSymbol][])
    .filter(([, symbol]) => UNITS[symbol].dimension === dimension)
    .sort(([, a], [, b]) => symbols.indexOf(a) - symbols.indexOf(b))
    .map(([alias, symbol]) => ({ alias, unit: symbol as UnitOf<D> }));
}
