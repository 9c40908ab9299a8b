// Small frames worked by hand in the tests. Plain offsets from the origin (hand-drawn members).
import type { FrameDocumentInput } from '@shared/model/frame-document';
import type { MemberInput } from '@shared/model/member';
import type { ModuleInput } from '@shared/model/module';
import { parseFrameDocument } from '@shared/model/parse';
import type { FrameDocument } from '@shared/model/frame-document';

export const at = (offset_mm: number) => ({ offset_mm });

export function member(id: string, axis: 'x' | 'y' | 'z', from: number, to: number, place: Partial<Record<'x' | 'y' | 'z', number>>, extra: Partial<MemberInput> = {}): MemberInput {
  const p: MemberInput['place'] = {};
  for (const [k, v] of Object.entries(place)) p[k as 'x'] = at(v as number);
  return { type: 'member', id, profile: '40x40-s8', axis, start: at(from), end: at(to), place: p, ...extra };
}

/**
 * A 1000 × 500 × 800 mm box in 40×40: four uprights at the corners (full height), rails along x and cross-members
 * along y at the top, drawn between the uprights' faces.
 */
export function boxFrame(extra: Partial<FrameDocumentInput> = {}): FrameDocument {
  return parseFrameDocument({
    schemaVersion: 1,
    name: 'box',
    members: [
      member('U1', 'z', 0, 800, { x: 0, y: 0 }),
      member('U2', 'z', 0, 800, { x: 960, y: 0 }),
      member('U3', 'z', 0, 800, { x: 0, y: 460 }),
      member('U4', 'z', 0, 800, { x: 960, y: 460 }),
      member('R1', 'x', 40, 960, { y: 0, z: 760 }),
      member('R2', 'x', 40, 960, { y: 460, z: 760 }),
      member('C1', 'y', 40, 460, { x: 0, z: 760 }),
      member('C2', 'y', 40, 460, { x: 960, z: 760 }),
    ],
    ...extra,
  });
}

export function module(id: string, size: [number, number, number], mass_kg: number, place: [number, number, number], extra: Partial<ModuleInput> = {}): ModuleInput {
  return {
    type: 'module',
    id,
    kind: 'other',
    size: { w_mm: size[0], d_mm: size[1], h_mm: size[2] },
    mass_kg,
    bearing: 'base',
    place: { x: at(place[0]), y: at(place[1]), z: at(place[2]) },
    ...extra,
  };
}

/** Four 40×40 uprights at the corners of a frame whose outer size is (w + 40) × (d + 40), h tall. */
export const cornerUprights = (w: number, d: number, h = 800): MemberInput[] => [
  member('U1', 'z', 0, h, { x: 0, y: 0 }),
  member('U2', 'z', 0, h, { x: w, y: 0 }),
  member('U3', 'z', 0, h, { x: 0, y: d }),
  member('U4', 'z', 0, h, { x: w, y: d }),
];
