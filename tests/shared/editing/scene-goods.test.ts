import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { projectScene } from '@shared/editing/scene';
import { sceneFromReport } from '@shared/editing/scene-from-report';
import { collectTargets } from '@shared/editing/snap';
import { VIEWS, type ViewId } from '@shared/editing/views';
import { buildCabinetRun, parseCabinetSpec } from '@shared/model/cabinet-run';
import { reportWithSheetGoods } from '@shared/panels/report-with-goods';

// The example side galley (scripts/examples/side-galley-spec.json, invented): its drawers, panels and countertop are
// in the editor's scene for drawing only; picking and snapping see the members and modules alone.
const spec = parseCabinetSpec(JSON.parse(readFileSync(new URL('../../../scripts/examples/side-galley-spec.json', import.meta.url), 'utf8')));
const doc = buildCabinetRun(spec);
const { report, goods } = reportWithSheetGoods(doc);
const scene = sceneFromReport(doc, report, goods);
const bare = { ...scene, goods: [] };

describe('sheet goods in the editor’s scene', () => {
  it('holds a thin box for every drawer and panel the goods size, and the countertop', () => {
    expect(goods).not.toBeNull();
    expect(scene.goods?.filter((g) => g.kind === 'drawer').length).toBe(goods?.drawers.length);
    expect(scene.goods?.some((g) => g.kind === 'panel')).toBe(true);
    expect(scene.goods?.filter((g) => g.kind === 'top').length).toBe(1);
    // A panel is as thin as its sheet (6 mm light-faced plywood by default) in one direction.
    const panel = scene.goods?.find((g) => g.kind === 'panel');
    const dims = [0, 1, 2].map((i) => (panel ? panel.box.max[i] - panel.box.min[i] : 0));
    expect(Math.min(...dims)).toBeCloseTo(6, 9);
  });
  for (const v of ['front', 'side', 'top'] as ViewId[]) {
    it(`${v} view: the items picked from and the snap targets are the same with or without them`, () => {
      const view = VIEWS[v];
      expect(projectScene(scene, view)).toEqual(projectScene(bare, view));
      expect(collectTargets(scene, view)).toEqual(collectTargets(bare, view));
    });
  }
});
