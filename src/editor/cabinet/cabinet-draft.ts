import { resolveProfile } from '@shared/catalog/profiles';
import { MODULE_LIBRARY } from '@shared/editing/module-library';
import type { CabinetBay, CabinetModule, CabinetSpec } from '@shared/model/cabinet-run';
import type { ModuleKind } from '@shared/model/module';

/** How a module in a bay bears, in the words the layout form offers. */
export const CABINET_BEARING_WORDS = [
  { title: 'Sits on bearers', value: 'base' },
  { title: 'Hangs from the top', value: 'hung' },
  { title: 'Runs on side rails', value: 'side-rails' },
] as const;
export type CabinetBearing = (typeof CABINET_BEARING_WORDS)[number]['value'];

/** One bay as the form holds it: a library module (sizes editable) or an open bay of a given width. */
export type DraftBay = {
  key: number;
  /** A library key, or 'open'. */
  type: string;
  name: string;
  w_mm: number;
  d_mm: number;
  h_mm: number;
  mass_kg: number;
  contents_kg: number;
  litres?: number;
  bearing: CabinetBearing;
  /** Height of the module's base above the seat. */
  raise_mm: number;
  /** An open bay's width. */
  width_mm: number;
  /** Modules stacked above this one in the same bay, bottom to top (each with the members that carry it). */
  stack: DraftBay[];
};

export type CabinetDraft = {
  name: string;
  profile: string;
  depth_mm: number;
  height_mm: number;
  seat_mm: number;
  clearance_mm: number;
  bays: DraftBay[];
};

/** Limits the form holds to, so a slip of the keyboard cannot make a 90 m cabinet. */
export const CABINET_LIMITS = { bays: 16, length_mm: 4000, mass_kg: 500 } as const;

let nextKey = 1;

/** A new bay from the library (or an open one), with the library's typical sizes. */
export function draftBay(type: string): DraftBay {
  const lib = MODULE_LIBRARY.find((m) => m.key === type);
  const key = nextKey++;
  if (!lib) return { key, type: 'open', name: '', w_mm: 300, d_mm: 400, h_mm: 400, mass_kg: 0, contents_kg: 0, bearing: 'base', raise_mm: 0, width_mm: 300, stack: [] };
  return {
    key,
    type,
    name: lib.label,
    ...lib.size,
    mass_kg: lib.mass_kg,
    contents_kg: lib.contents_kg,
    ...(lib.litres !== undefined ? { litres: lib.litres } : {}),
    // In a cabinet a sink sits in a bay on bearers (its bowl hangs in the worktop above); drawers run on rails.
    bearing: lib.bearing === 'side-rails' ? 'side-rails' : 'base',
    raise_mm: 0,
    width_mm: lib.size.w_mm,
    stack: [],
  };
}

/** Room between a stacked module and the one below: the clearance, plus a rail's thickness under one that sits. */
export const stackRoom = (m: Pick<DraftBay, 'bearing'>, clearance: number, t: number): number => (m.bearing === 'base' ? clearance + t : clearance);

/** Bottom and top (mm above the floor) of each module in a bay, bottom first, as the layout will place them. */
export function stackHeights(d: CabinetDraft, bay: DraftBay): { module: DraftBay; z0: number; z1: number }[] {
  const t = profileThickness(d.profile);
  const out: { module: DraftBay; z0: number; z1: number }[] = [];
  if (bay.type === 'open') return out;
  const z0 = bay.bearing === 'hung' ? d.height_mm - t - bay.h_mm : d.seat_mm + bay.raise_mm;
  out.push({ module: bay, z0, z1: z0 + bay.h_mm });
  let top = z0 + bay.h_mm;
  for (const m of bay.stack) {
    const b = top + (m.raise_mm > 0 ? m.raise_mm : stackRoom(m, d.clearance_mm, t));
    out.push({ module: m, z0: b, z1: b + m.h_mm });
    top = b + m.h_mm;
  }
  return out;
}

export function defaultDraft(): CabinetDraft {
  return { name: 'Galley cabinet', profile: '40x40-s8', depth_mm: 640, height_mm: 900, seat_mm: 80, clearance_mm: 10, bays: [draftBay('cooler'), draftBay('sink'), draftBay('drawers')] };
}

/** The first thing wrong with the draft, in the form's words, or null. */
export function draftProblem(d: CabinetDraft): string | null {
  const len = (v: number, what: string, min = 1) =>
    !Number.isFinite(v) || v < min || v > CABINET_LIMITS.length_mm ? `${what} must be between ${min} and ${CABINET_LIMITS.length_mm} mm` : null;
  if (!d.name.trim()) return 'Give the cabinet a name';
  if (d.name.length > 120) return 'The name must be at most 120 characters';
  if (d.bays.length === 0) return 'Add at least one bay';
  if (d.bays.length > CABINET_LIMITS.bays) return `At most ${CABINET_LIMITS.bays} bays in one run`;
  const t = profileThickness(d.profile);
  const first =
    len(d.depth_mm, 'Depth', 2 * t + 1) ??
    len(d.height_mm, 'Height', 2 * t + 1) ??
    len(d.seat_mm, 'Seat height', t) ??
    (d.seat_mm >= d.height_mm - t ? 'The seat must be below the top rails' : null) ??
    (d.clearance_mm < 0 || d.clearance_mm > 200 ? 'Clearance must be between 0 and 200 mm' : null);
  if (first) return first;
  for (const [i, b] of d.bays.entries()) {
    const label = `Bay ${i + 1}${b.name ? ` (${b.name})` : ''}`;
    if (b.type === 'open') {
      const p = len(b.width_mm, `${label}: width`);
      if (p) return p;
      continue;
    }
    const p = len(b.w_mm, `${label}: width`) ?? len(b.d_mm, `${label}: depth`) ?? len(b.h_mm, `${label}: height`);
    if (p) return p;
    if (b.name.length > 120) return `${label}: the name must be at most 120 characters`;
    if (!(b.mass_kg >= 0 && b.mass_kg <= CABINET_LIMITS.mass_kg) || !(b.contents_kg >= 0 && b.contents_kg <= CABINET_LIMITS.mass_kg))
      return `${label}: masses must be between 0 and ${CABINET_LIMITS.mass_kg} kg`;
    if (b.d_mm > d.depth_mm - 2 * t) return `${label} is ${b.d_mm} mm deep; inside the frame there is ${d.depth_mm - 2 * t} mm. Make the cabinet deeper or the module shallower.`;
    if (b.bearing !== 'hung' && d.seat_mm + b.raise_mm + b.h_mm > d.height_mm - t)
      return `${label} is too tall: ${b.h_mm} mm on the seat at ${d.seat_mm} mm reaches above the top rails at ${d.height_mm - t} mm.`;
    for (const m of b.stack) {
      const p2 = len(m.w_mm, `${label}: width of ${m.name || 'the module above'}`) ?? len(m.d_mm, `${label}: depth of ${m.name || 'the module above'}`) ?? len(m.h_mm, `${label}: height of ${m.name || 'the module above'}`);
      if (p2) return p2;
      if (m.d_mm > d.depth_mm - 2 * t) return `${label}: ${m.name || 'the module above'} is deeper than the inside of the frame (${d.depth_mm - 2 * t} mm).`;
    }
    if (b.stack.length > 0 && (b.bearing === 'hung' || b.stack.some((m) => m.bearing === 'hung')))
      return `${label}: a module that hangs from the top cannot have another stacked over it; make it sit on bearers or run on side rails.`;
    const heights = stackHeights(d, b);
    const top = heights[heights.length - 1];
    if (top && top.z1 > d.height_mm - t + 1e-6)
      return `${label}: the stack reaches ${Math.round(top.z1)} mm, above the top rails at ${d.height_mm - t} mm. Make a module lower, or the cabinet taller.`;
  }
  return null;
}

export function profileThickness(profile: string): number {
  try {
    const p = resolveProfile(profile);
    return Math.min(p.width_mm, p.height_mm);
  } catch {
    return 40;
  }
}

const slug = (s: string) => s.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 40) || 'module';

/** The spec `buildCabinetRun` lays out; module ids come from their names, kept unique. */
export function specFromDraft(d: CabinetDraft): CabinetSpec {
  const used = new Set<string>();
  const unique = (base: string) => {
    let id = base;
    for (let k = 2; used.has(id); k++) id = `${base}-${k}`;
    used.add(id);
    return id;
  };
  const bays: CabinetBay[] = d.bays.map((b, i) => {
    const id = `bay${i + 1}`;
    used.add(id);
    if (b.type === 'open') return { id, width_mm: b.width_mm };
    const stack = b.stack.map(toModule);
    return { id, module: toModule(b), ...(stack.length ? { stack } : {}) };
  });
  return { name: d.name.trim(), profile: d.profile, depth_mm: d.depth_mm, height_mm: d.height_mm, seat_mm: d.seat_mm, clearance_mm: d.clearance_mm, bays };

  function toModule(b: DraftBay): CabinetModule {
    const lib = MODULE_LIBRARY.find((m) => m.key === b.type);
    const name = b.name.trim() || lib?.label || 'Module';
    const module: CabinetModule = {
      id: unique(slug(name)),
      name,
      kind: (lib?.kind ?? 'other') as ModuleKind,
      bearing: b.bearing,
      size: { w_mm: b.w_mm, d_mm: b.d_mm, h_mm: b.h_mm },
      mass_kg: b.mass_kg,
      contents_kg: b.contents_kg,
      ...(lib?.kind === 'tank' && b.litres !== undefined ? { litres: b.litres } : {}),
      ...(b.raise_mm > 0 ? { raise_mm: b.raise_mm } : {}),
    };
    return module;
  }
}

/** Bay openings along the run (mm from the left outer face), for the preview. */
export function draftLayout(d: CabinetDraft): { t: number; width: number; bays: { x0: number; x1: number; bay: DraftBay }[] } {
  const t = profileThickness(d.profile);
  let x = t;
  const bays = d.bays.map((bay) => {
    const w = bay.type === 'open' ? bay.width_mm : Math.max(bay.w_mm, ...bay.stack.map((m) => m.w_mm)) + 2 * d.clearance_mm;
    const r = { x0: x, x1: x + w, bay };
    x += w + t;
    return r;
  });
  return { t, width: x, bays };
}
