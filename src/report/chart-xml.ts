/**
 * Small helpers that keep the chart's SVG well formed and compact: text escaping, number
 * formatting and label truncation. Internal to the report module.
 *
 * @module
 * @internal
 */

/**
 * Escapes text for XML content and attribute values. `& < > " '` become entity references;
 * tab, line feed and carriage return become character references (so that attribute values
 * keep them); characters that XML 1.0 cannot carry at all (other C0 controls, lone
 * surrogates, U+FFFE, U+FFFF) become U+FFFD.
 * @internal
 */
export function escapeXml(text: string): string {
  let out = '';
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 0x26) out += '&amp;';
    else if (c === 0x3c) out += '&lt;';
    else if (c === 0x3e) out += '&gt;';
    else if (c === 0x22) out += '&quot;';
    else if (c === 0x27) out += '&apos;';
    else if (c === 0x09 || c === 0x0a || c === 0x0d) out += `&#${c};`;
    else if (c < 0x20 || c === 0xfffe || c === 0xffff) out += '\ufffd';
    else if (c >= 0xd800 && c <= 0xdbff) {
      const next = text.charCodeAt(i + 1);
      if (next >= 0xdc00 && next <= 0xdfff) {
        out += text.slice(i, i + 2);
        i++;
      } else out += '\ufffd';
    } else if (c >= 0xdc00 && c <= 0xdfff) out += '\ufffd';
    else out += text.charAt(i);
  }
  return out;
}

/**
 * A coordinate with at most one decimal, without a trailing `.0` and without `-0`.
 * @internal
 */
export function fmt(value: number): string {
  const r = Math.round(value * 10) / 10;
  return r === 0 ? '0' : String(r);
}

/**
 * A value for a tooltip: four significant digits, no trailing zeros.
 * @internal
 */
export function fmtValue(value: number): string {
  const r = Number(value.toPrecision(4));
  return r === 0 ? '0' : String(r);
}

/**
 * Cuts text to at most `max` code points, ending it with an ellipsis when cut.
 * @internal
 */
export function truncate(text: string, max: number): string {
  const chars = Array.from(text);
  return chars.length <= max ? text : `${chars.slice(0, max - 1).join('')}\u2026`;
}
