import { moduleLabel } from '../model/module';
import { overlapOn, type Box } from './box';
import { memberRef } from './names';
import type { MemberGeometry } from './resolve-members';
import type { ModuleGeometry } from './resolve-modules';
import type { ReportWarning } from './warnings';

/**
 * Two solids that overlap by more than this on every axis run into each other (mm). Faces that touch (a module
 * on its bearers) or a module resting within the bearing tolerance do not; a module sunk into a rail does.
 */
const CLASH_MM = 1;

const depth = (a: Box, b: Box) => Math.min(overlapOn(a, b, 0), overlapOn(a, b, 1), overlapOn(a, b, 2));

const memberWords = (m: MemberGeometry): string => memberRef(m.member.id);

/**
 * Modules that run into a rail or cross-member or into another module: a stack taller than the room under the
 * top, a drawer pushed into the sink above it, a box dropped through a rail. One warning per module, the deepest clash, saying what to
 * change.
 */
export function findClashes(modules: readonly ModuleGeometry[], members: readonly MemberGeometry[], effective: readonly Box[]): ReportWarning[] {
  const out: ReportWarning[] = [];
  modules.forEach((g, i) => {
    let worst: { words: string; mm: number } | null = null;
    for (const m of members) {
      // Uprights are left out: a shelf or a sheet is often drawn to the frame's outside, notched round the posts.
      if (m.axis === 'z') continue;
      const d = depth(g.box, effective[m.index]);
      if (d > CLASH_MM && (!worst || d > worst.mm)) worst = { words: memberWords(m), mm: d };
    }
    for (let j = i + 1; j < modules.length; j++) {
      const d = depth(g.box, modules[j].box);
      if (d > CLASH_MM && (!worst || d > worst.mm)) worst = { words: moduleLabel(modules[j].module), mm: d };
    }
    if (!worst) return;
    const mm = Math.round(worst.mm * 10) / 10;
    out.push({
      code: 'module-clash',
      module_id: g.module.id,
      message: `${moduleLabel(g.module)} runs ${mm} mm into ${worst.words}: move it, choose a smaller one, or give the frame more room there`,
    });
  });
  return out;
}
