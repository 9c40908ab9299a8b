import { readFileSync } from 'node:fs';
import { buildCabinetRun, type CabinetSpec } from '@shared/model/cabinet-run';
import type { FrameDocument } from '@shared/model/frame-document';

/** The side galley of scripts/examples/side-galley-spec.json (cooler + drawer | drawers + sink | tank + shelf | open). */
export const galleySpec = (): CabinetSpec => JSON.parse(readFileSync(new URL('../../../scripts/examples/side-galley-spec.json', import.meta.url), 'utf8'));
export const galleyDoc = (): FrameDocument => buildCabinetRun(galleySpec());

/** A plain two-bay cabinet: a cooler alone in one bay, an open bay of 500 mm beside it. */
export function coolerAndOpenBay(): FrameDocument {
  return buildCabinetRun({
    name: 'Two bays',
    runId: 'r',
    profile: '40x40-s8',
    depth_mm: 600,
    height_mm: 900,
    seat_mm: 120,
    clearance_mm: 10,
    bays: [
      { id: 'bay-a', module: { id: 'cooler', name: 'Camp cooler', kind: 'appliance', bearing: 'base', size: { w_mm: 400, d_mm: 500, h_mm: 450 }, mass_kg: 15, contents_kg: 20 } },
      { id: 'bay-b', width_mm: 500 },
    ],
  });
}
