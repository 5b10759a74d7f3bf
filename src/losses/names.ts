/**
 * Close-name suggestions for unknown catalogue ids.
 * @internal
 */

/** Characters of a wanted name that {@link closeNames} compares (longer than any catalogue name). */
const COMPARED_LENGTH = 64;

/** Levenshtein edit distance between two short strings. */
export function editDistance(a: string, b: string): number {
  const row = new Float64Array(b.length + 1);
  for (let j = 0; j <= b.length; j++) row[j] = j;
  for (let i = 1; i <= a.length; i++) {
    let diagonal = row[0] as number;
    row[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const above = row[j] as number;
      const cost = a.charCodeAt(i - 1) === b.charCodeAt(j - 1) ? 0 : 1;
      row[j] = Math.min(above + 1, (row[j - 1] as number) + 1, diagonal + cost);
      diagonal = above;
    }
  }
  return row[b.length] as number;
}

/**
 * Up to `limit` names from `names` closest to `wanted`: those that contain every word of
 * `wanted` come first, then the smallest edit distances.
 */
export function closeNames(wanted: string, names: readonly string[], limit = 5): string[] {
  // Only the first characters are compared: no name is longer, and the edit distance costs
  // the product of the two lengths. The work is then linear in the length of `wanted` (one
  // lower-casing pass) whatever the caller passes.
  const w = wanted.slice(0, COMPARED_LENGTH).toLowerCase().trim();
  const words = w.split(/[^a-z0-9]+/).filter((x) => x.length > 1);
  const scored = names.map((name) => {
    const containsAll = words.length > 0 && words.every((x) => name.includes(x));
    const shared = words.filter((x) => name.includes(x)).length;
    return { name, score: (containsAll ? 0 : 1000) - 10 * shared + editDistance(w, name) };
  });
  scored.sort((p, q) => p.score - q.score || (p.name < q.name ? -1 : 1));
  return scored.slice(0, limit).map((s) => s.name);
}
