import type { Box } from '@shared/engine/box';
import { frameDocumentSchema, type FrameDocument, type FrameDocumentInput } from '@shared/model/frame-document';
import type { Scene, SceneMember } from '@shared/editing/scene';

/** A small two-bay frame: two uprights at the run's ends, one between, a rail on top hung off the uprights. */
export function twoBayDoc(extra: Partial<FrameDocumentInput> = {}): FrameDocument {
  return frameDocumentSchema.parse({
    schemaVersion: 1,
    name: 'test',
    modules: [
      { type: 'module', id: 'cooler', kind: 'appliance', size: { w_mm: 400, d_mm: 500, h_mm: 500 }, mass_kg: 20, bearing: 'base' },
      { type: 'module', id: 'drawers', kind: 'drawer-stack', size: { w_mm: 300, d_mm: 500, h_mm: 400 }, mass_kg: 10, bearing: 'side-rails' },
    ],
    runs: [
      {
        type: 'run',
        id: 'run1',
        upright_mm: 40,
        clearance_mm: 5,
        bays: [
          { id: 'bay-a', module: 'cooler' },
          { id: 'bay-b', module: 'drawers' },
        ],
      },
    ],
    members: [
      { type: 'member', id: 'u0', profile: '40x40-s8', axis: 'z', start: { offset_mm: 0 }, end: { offset_mm: 800 }, place: { x: { datum: 'run1.u0' } } },
      { type: 'member', id: 'u1', profile: '40x40-s8', axis: 'z', start: { offset_mm: 0 }, end: { offset_mm: 800 }, place: { x: { datum: 'run1.u1' } } },
      { type: 'member', id: 'u2', profile: '40x40-s8', axis: 'z', start: { offset_mm: 0 }, end: { offset_mm: 800 }, place: { x: { datum: 'run1.u2' } } },
      {
        type: 'member',
        id: 'top',
        profile: '40x40-s8',
        axis: 'x',
        start: { member: 'u0', face: 'max' },
        end: { member: 'u2', face: 'min' },
        place: { z: { offset_mm: 760 } },
      },
    ],
    ...extra,
  });
}

export const box = (x0: number, y0: number, z0: number, x1: number, y1: number, z1: number): Box => ({ min: [x0, y0, z0], max: [x1, y1, z1] });

export function sceneMember(id: string, axis: 'x' | 'y' | 'z', b: Box, extra: Partial<SceneMember> = {}): SceneMember {
  return {
    id,
    index: 0,
    axis,
    role: axis === 'z' ? 'upright' : axis === 'x' ? 'rail' : 'cross-member',
    box: b,
    drawn: b,
    profileId: '40x40-s8',
    profileName: '40×40 slot 8',
    slot_mm: 8.2,
    mark: null,
    title: axis === 'z' ? 'upright' : axis === 'x' ? 'rail' : 'cross-member',
    cutLength_mm: 0,
    utilisation: null,
    ...extra,
  };
}

export function sceneOf(members: SceneMember[], extra: Partial<Scene> = {}): Scene {
  members.forEach((m, i) => (m.index = i));
  return { members, modules: [], bays: [], bounds: null, cog: null, ...extra };
}
