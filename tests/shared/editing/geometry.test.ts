import { describe, expect, it } from 'vitest';
import { fitRect, toScreenX, toScreenY, toWorld, zoomAt } from '@shared/editing/camera';
import { gridSteps, gridValues } from '@shared/editing/grid';
import { boxSelect, hitEndHandle, hitItem } from '@shared/editing/hit-test';
import { projectScene } from '@shared/editing/scene';
import { collectTargets, snapMove, snapValue } from '@shared/editing/snap';
import { projectBox, VIEWS } from '@shared/editing/views';
import { box, sceneMember, sceneOf } from './fixtures';

describe('views', () => {
  const b = box(10, 20, 30, 110, 220, 330);
  it('front shows x across and z up; side y across; top x across and y up', () => {
    expect(projectBox(VIEWS.front, b)).toMatchObject({ x0: 10, x1: 110, y0: 30, y1: 330 });
    expect(projectBox(VIEWS.side, b)).toMatchObject({ x0: 20, x1: 220, y0: 30, y1: 330 });
    expect(projectBox(VIEWS.top, b)).toMatchObject({ x0: 10, x1: 110, y0: 20, y1: 220 });
  });
  it('in the front view a member nearer the front (lower y) is nearer the viewer', () => {
    expect(projectBox(VIEWS.front, box(0, 0, 0, 1, 1, 1)).near).toBeGreaterThan(projectBox(VIEWS.front, box(0, 500, 0, 1, 501, 1)).near);
  });
  it('from above the higher member is nearer', () => {
    expect(projectBox(VIEWS.top, box(0, 0, 800, 1, 1, 840)).near).toBeGreaterThan(projectBox(VIEWS.top, box(0, 0, 0, 1, 1, 40)).near);
  });
});

describe('camera', () => {
  it('zooming at a point keeps the world point under it', () => {
    const c = { scale: 0.5, ox: 100, oy: 400 };
    const before = toWorld(c, 300, 200);
    const z = zoomAt(c, 1.7, 300, 200);
    const after = toWorld(z, 300, 200);
    expect(after.h).toBeCloseTo(before.h, 9);
    expect(after.v).toBeCloseTo(before.v, 9);
  });
  it('fitting a rectangle puts it inside the viewport with the margin, centred', () => {
    const c = fitRect({ x0: 0, x1: 1000, y0: 0, y1: 500 }, 800, 600, 50);
    expect(toScreenX(c, 0)).toBeCloseTo(50);
    expect(toScreenX(c, 1000)).toBeCloseTo(750);
    expect((toScreenY(c, 0) + toScreenY(c, 500)) / 2).toBeCloseTo(300);
  });
});

describe('grid', () => {
  it('picks the finest step at least 10 px apart', () => {
    expect(gridSteps(0.5, 'mm').minor).toBe(20); // 10 mm would be 5 px
    expect(gridSteps(2, 'mm').minor).toBe(5);
  });
  it('inch grids step in tape fractions and major lines fall on whole multiples', () => {
    const s = gridSteps(4, 'in'); // 1/8 in = 3.175 mm = 12.7 px
    expect(s.minor).toBeCloseTo(25.4 / 8, 9);
    expect(s.major / s.minor).toBe(Math.round(s.major / s.minor));
  });
  it('lists multiples in a range', () => {
    expect(gridValues(-15, 25, 10)).toEqual([-10, 0, 10, 20]);
  });
});

describe('hit testing', () => {
  const scene = sceneOf([sceneMember('back', 'x', box(0, 500, 0, 1000, 540, 40)), sceneMember('front', 'x', box(0, 0, 0, 1000, 40, 40))]);
  const { members } = projectScene(scene, VIEWS.front);
  it('picks the nearest of two overlapping members', () => {
    expect(hitItem(members, 500, 20)?.id).toBe('front');
  });
  it('picks a thin member within the padding, and nothing beyond it', () => {
    expect(hitItem(members, 500, 45, 6)?.id).toBe('front');
    expect(hitItem(members, 500, 60, 6)).toBeNull();
  });
  it('box-select rightwards takes only what is wholly inside, leftwards what it touches', () => {
    const small = projectScene(sceneOf([sceneMember('a', 'z', box(0, 0, 0, 40, 40, 800)), sceneMember('b', 'x', box(40, 0, 0, 1000, 40, 40))]), VIEWS.front).members;
    expect(boxSelect(small, -10, -10, 100, 900).map((r) => r.id)).toEqual(['a']);
    expect(boxSelect(small, 100, 900, -10, -10).map((r) => r.id).sort()).toEqual(['a', 'b']);
  });
  it('finds end handles', () => {
    const r = { x0: 0, x1: 1000, y0: 0, y1: 40 };
    expect(hitEndHandle(r, 'h', 3, 20, 5)).toBe('start');
    expect(hitEndHandle(r, 'h', 998, 20, 5)).toBe('end');
    expect(hitEndHandle(r, 'h', 500, 20, 5)).toBeNull();
  });
});

describe('snapping', () => {
  const scene = sceneOf([sceneMember('u0', 'z', box(0, 0, 0, 40, 40, 800)), sceneMember('u1', 'z', box(460, 0, 0, 500, 40, 800))]);
  const targets = collectTargets(scene, VIEWS.front);
  it('snaps to the nearest member face within tolerance and attaches to it', () => {
    const s = snapValue(targets.h, 43, 5, 10);
    expect(s.value).toBe(40);
    expect(s.target?.ref).toEqual({ member: 'u0', face: 'max', offset_mm: 0 });
  });
  it('falls back to the grid, which attaches nothing', () => {
    const s = snapValue(targets.h, 233, 5, 10);
    expect(s.value).toBe(230);
    expect(s.target?.ref).toBeNull();
  });
  it('with snapping off (no grid, zero tolerance) the value stays', () => {
    expect(snapValue(targets.h, 233.3, 0, null).value).toBe(233.3);
  });
  it('an upright’s ends on the v axis are member ends, preferred over a face at the same place', () => {
    const s = snapValue(targets.v, 798, 5, null);
    expect(s.target?.kind).toBe('end');
  });
  it('a moved box snaps by whichever edge lands closest', () => {
    // Edges at 100 and 140 moved by 317: 417 and 457; 457 is 3 mm from u1's face at 460.
    const m = snapMove(targets.h, [100, 140], 317, 5, null);
    expect(m.delta).toBe(320);
  });
  it('excluded members offer no targets', () => {
    const t = collectTargets(scene, VIEWS.front, new Set(['u0']));
    expect(t.h.some((x) => x.ref && 'member' in x.ref && x.ref.member === 'u0')).toBe(false);
  });
});

describe('snapping prefers what the point actually touches', () => {
  // An upright at x 0–40 running 0–800 high, and a rail across its top whose end lines up with the upright's face.
  const scene = sceneOf([sceneMember('u', 'z', box(0, 0, 0, 40, 40, 800)), sceneMember('top', 'x', box(40, 0, 760, 500, 40, 800))]);
  const targets = collectTargets(scene, VIEWS.front);
  it('at mid-height a point by x = 40 attaches to the upright’s face, not the end of the rail above', () => {
    const s = snapValue(targets.h, 42, 5, null, 300);
    expect(s.target?.ref).toEqual({ member: 'u', face: 'max', offset_mm: 0 });
  });
  it('at the rail’s height the rail’s end (a member end) is preferred', () => {
    const s = snapValue(targets.h, 42, 5, null, 780);
    expect(s.target?.ref).toEqual({ member: 'top', face: 'min', offset_mm: 0 });
  });
});
