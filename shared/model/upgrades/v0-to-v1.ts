/**
 * Version 0 was the pre-release format: no `schemaVersion`, `units` a bare string ("mm" or "in", sixteenths),
 * the kerf as `settings.kerf`, and no `joinMethods` / `joints` lists. Version 1 names every length with its unit
 * and keeps display units as `{ display, frac }`.
 */
export function upgradeV0toV1(doc: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = { ...doc, schemaVersion: 1 };
  if (typeof doc.units === 'string') out.units = { display: doc.units, frac: 16 };
  if (doc.settings && typeof doc.settings === 'object' && !Array.isArray(doc.settings)) {
    const { kerf, ...rest } = doc.settings as Record<string, unknown>;
    out.settings = kerf === undefined ? rest : { ...rest, kerf_mm: kerf };
  }
  out.joinMethods ??= [];
  out.joints ??= [];
  return out;
}
