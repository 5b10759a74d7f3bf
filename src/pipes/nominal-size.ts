/**
 * Nominal pipe size (NPS) notation: the trade strings '1/8' ... '1-1/4' ... '24', the same
 * sizes as numbers (0.125, 1.25), and the metric designation DN of ISO 6708 as listed beside
 * each NPS in ASME B36.10M Table 1 ('DN50' for NPS 2).
 *
 * @module
 */
import { argumentError } from '../errors';

/**
 * NPS and DN side by side, as ASME B36.10M (Table 1) lists them for NPS 1/8 to 24.
 * [trade notation, value in inches, DN].
 */
const NPS_DN: readonly (readonly [string, number, number])[] = [
  ['1/8', 0.125, 6],
  ['1/4', 0.25, 8],
  ['3/8', 0.375, 10],
  ['1/2', 0.5, 15],
  ['5/8', 0.625, 0], // copper tube size only (ASTM B88); no DN.
  ['3/4', 0.75, 20],
  ['1', 1, 25],
  ['1-1/4', 1.25, 32],
  ['1-1/2', 1.5, 40],
  ['2', 2, 50],
  ['2-1/2', 2.5, 65],
  ['3', 3, 80],
  ['3-1/2', 3.5, 90],
  ['4', 4, 100],
  ['5', 5, 125],
  ['6', 6, 150],
  ['8', 8, 200],
  ['10', 10, 250],
  ['12', 12, 300],
  ['14', 14, 350],
  ['16', 16, 400],
  ['18', 18, 450],
  ['20', 20, 500],
  ['22', 22, 550],
  ['24', 24, 600],
];

const SIZE_TEXT = /^(?:(\d+)(?:[- ](\d+)\/(\d+))?|(\d+)\/(\d+))$/;

/** Value in inches of a trade notation string, or NaN when the text is not one. */
function parseTradeNotation(text: string): number {
  const m = SIZE_TEXT.exec(text);
  if (m === null) return Number.NaN;
  const [, whole, num, den, fNum, fDen] = m;
  if (fNum !== undefined && fDen !== undefined) return Number(fNum) / Number(fDen);
  const w = Number(whole);
  if (num !== undefined && den !== undefined) return w + Number(num) / Number(den);
  return w;
}

/**
 * The canonical trade notation and DN of a nominal size given as trade text, a number of
 * inches or 'DN<n>'. Returns undefined for a well-formed size that the table does not hold;
 * throws `INVALID_ARGUMENT` for input that is not a size at all.
 * @internal
 */
export function resolveNominalSize(
  nps: unknown,
  parameter: string,
  allowDn = true,
): { readonly nps: string; readonly dn: number | undefined; readonly inches: number } | undefined {
  let inches: number;
  let dn: number | undefined;
  if (typeof nps === 'number') {
    if (!Number.isFinite(nps) || nps <= 0) {
      throw argumentError('INVALID_ARGUMENT', parameter, nps, 'in', 'a nominal size > 0');
    }
    inches = nps;
  } else if (typeof nps === 'string') {
    const text = nps.trim();
    const dnMatch = /^DN\s?(\d+)$/i.exec(text);
    if (dnMatch && allowDn) {
      dn = Number(dnMatch[1]);
      inches = Number.NaN;
    } else {
      inches = parseTradeNotation(text);
      if (!(inches > 0 && Number.isFinite(inches))) {
        throw argumentError(
          'INVALID_ARGUMENT',
          parameter,
          nps,
          undefined,
          allowDn
            ? "trade notation such as '1/2', '1-1/4', '2', a number of inches, or 'DN50'"
            : "trade notation such as '1/2', '1-1/4', '2', or a number of inches",
        );
      }
    }
  } else {
    throw argumentError(
      'INVALID_ARGUMENT',
      parameter,
      nps,
      undefined,
      "a string such as '1-1/4' or 'DN50', or a number of inches",
    );
  }
  for (const [name, value, rowDn] of NPS_DN) {
    const hit = dn === undefined ? Math.abs(value - inches) < 1e-9 : rowDn !== 0 && rowDn === dn;
    if (hit) return { nps: name, dn: rowDn === 0 ? undefined : rowDn, inches: value };
  }
  return undefined;
}
