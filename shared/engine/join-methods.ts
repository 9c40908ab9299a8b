import type { FrameDocument } from '../model/frame-document';
import type { JoinMethod } from '../model/join-method';
import {
  bracketMass_g,
  connectorMass_g,
  endCapMass_g,
  FASTENER_DATA,
  plateMass_g,
} from './fastening';
import { fastenerOf, type ProfileInfo } from './profile-table';

export type PartKind = 'bracket' | 'plate' | 'connector' | 'end-cap' | 'part';

export type RecipePart = { key: string; kind: PartKind; name: string; qty: number; mass_g: number };

/** The hardware and machining one use of a method needs. */
export type Recipe = {
  parts: RecipePart[];
  /** Screws with T-nuts into each member's slot. */
  fastenersPerMember: number;
  /** What each of those screws passes through before its nut. */
  clamp_mm: number;
  endTap: boolean;
  accessHole: boolean;
  /** Brackets sit inside the corner; a plate lies over the joint on a side face. */
  placement: 'inside-corner' | 'side-plate';
};

export type MethodDef = {
  id: string;
  name: string;
  appliesTo: 'joint' | 'free-end' | 'both';
  /** `butting` is the member whose end it is; `through` the member it butts against (none for a free end). */
  recipe(butting: ProfileInfo, through: ProfileInfo | null): Recipe;
};

const sizeLabel = (p: ProfileInfo): string =>
  p.profile.series === 'inch' ? `${Math.round((p.module_mm / 25.4) * 100) / 100} in` : `${Math.round(p.module_mm * 10) / 10} mm`;

const EMPTY: Omit<Recipe, 'parts'> = { fastenersPerMember: 0, clamp_mm: 0, endTap: false, accessHole: false, placement: 'inside-corner' };

export const BUILT_IN_METHODS: readonly MethodDef[] = [
  {
    id: 'corner-bracket',
    name: 'Inside corner bracket',
    appliesTo: 'joint',
    recipe: (b) => {
      const f = fastenerOf(b);
      return {
        ...EMPTY,
        parts: [{ key: `bracket|${sizeLabel(b)}|${f}`, kind: 'bracket', name: `corner bracket for ${sizeLabel(b)} profile`, qty: 1, mass_g: bracketMass_g(b.module_mm, f) }],
        fastenersPerMember: 1,
        clamp_mm: FASTENER_DATA[f].bracket_mm,
      };
    },
  },
  {
    id: 'end-connector',
    name: 'End connector (end tap and access hole)',
    appliesTo: 'joint',
    recipe: (b) => {
      const f = fastenerOf(b);
      return {
        ...EMPTY,
        parts: [{ key: `connector|${f}`, kind: 'connector', name: `end connector ${f}`, qty: 1, mass_g: connectorMass_g(b.module_mm, f) }],
        endTap: true,
        accessHole: true,
      };
    },
  },
  {
    id: 'gusset',
    name: 'Gusset plate',
    appliesTo: 'joint',
    recipe: (b) => {
      const f = fastenerOf(b);
      return {
        ...EMPTY,
        parts: [{ key: `plate|${sizeLabel(b)}|${f}`, kind: 'plate', name: `gusset plate for ${sizeLabel(b)} profile`, qty: 1, mass_g: plateMass_g(b.module_mm, f) }],
        fastenersPerMember: 2,
        clamp_mm: FASTENER_DATA[f].plate_mm,
        placement: 'side-plate',
      };
    },
  },
  {
    id: 'end-cap',
    name: 'End cap',
    appliesTo: 'free-end',
    recipe: (b) => ({
      ...EMPTY,
      parts: [{ key: `cap|${b.id}`, kind: 'end-cap', name: `end cap for ${b.name}`, qty: 1, mass_g: endCapMass_g(b.profile.width_mm, b.profile.height_mm) }],
    }),
  },
  { id: 'none', name: 'Nothing (left open, or joined by other means)', appliesTo: 'both', recipe: () => ({ ...EMPTY, parts: [] }) },
];

function customMethod(m: JoinMethod): MethodDef {
  return {
    id: m.id,
    name: m.name,
    appliesTo: m.appliesTo,
    recipe: () => ({
      parts: m.parts.map((p) => ({ key: `part|${m.id}|${p.name}`, kind: 'part' as const, name: p.name, qty: p.qty, mass_g: p.mass_g ?? 0 })),
      fastenersPerMember: m.fastenersPerMember,
      clamp_mm: m.clamp_mm,
      endTap: m.endTap,
      accessHole: m.accessHole,
      placement: 'inside-corner',
    }),
  };
}

/** A method whose recipe is worked out once per pair of profiles (a frame has few pairs and many joints). */
function memoised(def: MethodDef): MethodDef {
  const cache = new Map<string, Recipe>();
  return {
    ...def,
    recipe: (butting, through) => {
      const key = `${butting.id}|${through?.id ?? ''}`;
      let r = cache.get(key);
      if (!r) {
        r = def.recipe(butting, through);
        cache.set(key, r);
      }
      return r;
    },
  };
}

/** Built-in methods and the document's own, by id; one table per report. */
export function methodTable(doc: Pick<FrameDocument, 'joinMethods'>): Map<string, MethodDef> {
  const table = new Map<string, MethodDef>(BUILT_IN_METHODS.map((m) => [m.id, memoised(m)]));
  for (const m of doc.joinMethods) table.set(m.id, memoised(customMethod(m)));
  return table;
}

export const fitsJoint = (m: MethodDef | undefined): boolean => m !== undefined && m.appliesTo !== 'free-end';
export const fitsFreeEnd = (m: MethodDef | undefined): boolean => m !== undefined && m.appliesTo !== 'joint';
