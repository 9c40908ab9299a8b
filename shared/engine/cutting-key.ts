/** A part as the saw sees it: what it is cut from, how long, and the mark written on it. */
export type CutPart = { mark: string; profile: string; cut_length_mm: number };

/** FNV-1a over UTF-16 code units, 32 bits, as hex (FNV: Fowler, Noll, Vo; offset 2166136261, prime 16777619). */
export function fnv1a32(text: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h.toString(16).padStart(8, '0');
}

/**
 * What cutting depends on, as a short key: the parts by profile, cut length (to 0.1 mm, as the saw list rounds)
 * and mark, in no particular order. Member ids, names, modules and the version number do not count, so a change
 * that is undone, or one that moves nothing the saw cuts, gives the same key.
 */
export function cuttingKey(parts: readonly CutPart[]): string {
  const lines = parts.map((p) => `${p.profile}|${Math.round(p.cut_length_mm * 10)}|${p.mark}`).sort();
  return `${parts.length}-${fnv1a32(lines.join('\n'))}`;
}
