// An independent check of a sheet plan, used by the tests and the benchmark: it replays the cuts in order and
// reports every way the plan could not be cut as printed.
//  - every part lies inside the sheet after trim, in its own size, turned only where it has no grain;
//  - no two parts come closer than one kerf (their grown rectangles do not overlap);
//  - each cut, in order, runs from edge to edge of one piece that earlier cuts have made, and splits it in two
//    (kerf on the far side of the line); at the end no piece holds more than one part;
//  - every part of the job is placed exactly once.
import type { ValidSheetJob } from './job';
import type { SheetPlan } from './plan';

const EPS = 1e-6;
type Piece = { x0: number; y0: number; x1: number; y1: number };

export function checkSheetPlan(job: ValidSheetJob, plan: SheetPlan): string[] {
  const problems: string[] = [];
  const { kerf, trim } = job;
  const want = new Map<string, number>();
  for (const p of job.parts) {
    const key = `${p.label}|${p.length}|${p.width}|${p.grain}`;
    want.set(key, (want.get(key) ?? 0) + p.qty);
  }
  const grainOf = new Map(job.parts.map((p) => [`${p.label}|${p.length}|${p.width}`, p.grain]));
  plan.sheets.forEach((s, si) => {
    const rects = s.placements.map((p) => {
      const dx = p.rotated ? p.width : p.length;
      const dy = p.rotated ? p.length : p.width;
      return { p, x0: p.x, y0: p.y, x1: p.x + dx, y1: p.y + dy };
    });
    for (const r of rects) {
      const tag = `sheet ${si + 1}, part '${r.p.label}'`;
      if (r.x0 < trim - EPS || r.y0 < trim - EPS || r.x1 > s.length - trim + EPS || r.y1 > s.width - trim + EPS) problems.push(`${tag} runs past the trimmed sheet`);
      const grain = grainOf.get(`${r.p.label}|${r.p.length}|${r.p.width}`);
      if (grain && r.p.rotated) problems.push(`${tag} is turned against its grain`);
      const key = `${r.p.label}|${r.p.length}|${r.p.width}|${grain}`;
      want.set(key, (want.get(key) ?? 0) - 1);
    }
    for (let i = 0; i < rects.length; i++) {
      for (let j = i + 1; j < rects.length; j++) {
        const a = rects[i];
        const b = rects[j];
        const apart = a.x1 + kerf <= b.x0 + EPS || b.x1 + kerf <= a.x0 + EPS || a.y1 + kerf <= b.y0 + EPS || b.y1 + kerf <= a.y0 + EPS;
        if (!apart) problems.push(`sheet ${si + 1}: parts '${a.p.label}' and '${b.p.label}' are closer than one kerf`);
      }
    }
    let pieces: Piece[] = [{ x0: trim, y0: trim, x1: s.length - trim, y1: s.width - trim }];
    s.cuts.forEach((c, ci) => {
      if (c.kind === 'trim') {
        const full = (Math.abs(c.y1 - c.y2) < EPS && c.x1 <= EPS && c.x2 >= s.length - EPS) || (Math.abs(c.x1 - c.x2) < EPS && Math.abs(c.y1 - trim) < EPS && Math.abs(c.y2 - (s.width - trim)) < EPS);
        if (!full) problems.push(`sheet ${si + 1}, cut ${ci + 1}: a trim cut that does not run the sheet's length or its trimmed width`);
        return;
      }
      const horizontal = Math.abs(c.y1 - c.y2) < EPS;
      const k = pieces.findIndex((p) =>
        horizontal
          ? Math.abs(c.x1 - p.x0) < EPS && Math.abs(c.x2 - p.x1) < EPS && c.y1 > p.y0 + EPS && c.y1 < p.y1 - EPS
          : Math.abs(c.y1 - p.y0) < EPS && Math.abs(c.y2 - p.y1) < EPS && c.x1 > p.x0 + EPS && c.x1 < p.x1 - EPS,
      );
      if (k < 0) {
        problems.push(`sheet ${si + 1}, cut ${ci + 1}: does not run edge to edge of any piece cut so far`);
        return;
      }
      const p = pieces[k];
      const halves: Piece[] = horizontal
        ? [{ ...p, y1: c.y1 }, { ...p, y0: Math.min(p.y1, c.y1 + kerf) }]
        : [{ ...p, x1: c.x1 }, { ...p, x0: Math.min(p.x1, c.x1 + kerf) }];
      pieces = [...pieces.slice(0, k), ...halves, ...pieces.slice(k + 1)];
    });
    for (const p of pieces) {
      const inside = rects.filter((r) => r.x0 < p.x1 - EPS && r.x1 > p.x0 + EPS && r.y0 < p.y1 - EPS && r.y1 > p.y0 + EPS);
      if (inside.length > 1) problems.push(`sheet ${si + 1}: parts ${inside.map((r) => `'${r.p.label}'`).join(', ')} are not cut apart`);
      for (const r of inside) {
        if (r.x0 < p.x0 - EPS || r.x1 > p.x1 + EPS || r.y0 < p.y0 - EPS || r.y1 > p.y1 + EPS) problems.push(`sheet ${si + 1}: a cut runs through part '${r.p.label}'`);
      }
    }
  });
  for (const [key, left] of want) if (left !== 0) problems.push(`part ${key.split('|')[0] || '(no label)'}: placed ${left > 0 ? `${left} too few` : `${-left} too many`} times`);
  if (plan.sheetCount !== plan.sheets.length) problems.push('sheetCount differs from the sheets listed');
  if (plan.lowerBound > plan.sheetCount) problems.push('lower bound above the sheet count');
  return problems;
}
