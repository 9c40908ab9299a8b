import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { computeReport } from '@shared/engine/report';
import { buildCabinetRun, parseCabinetSpec } from '@shared/model/cabinet-run';
import { sheetPlanPdf } from '../../server/pdf';
import { frameSheetPlans } from '../../server/modules/orders/sheet-plans';
import { meta } from '../shared/shop/fixtures';
import { pdfText } from '../support/pdf-text';

// The example side galley (invented) through the whole chain: openings → drawers, faces, panels, countertop →
// sheet plans per material → the printed plan.
const spec = parseCabinetSpec(JSON.parse(readFileSync(new URL('../../scripts/examples/side-galley-spec.json', import.meta.url), 'utf8')));
const report = computeReport(buildCabinetRun(spec));

describe('printed sheet plan', () => {
  it('a heading per material, a diagram heading per sheet, every cut numbered and every part labelled', async () => {
    const plans = frameSheetPlans(report, 300);
    expect(plans.length).toBeGreaterThan(1);
    const buf = await sheetPlanPdf(plans, meta);
    expect(buf.subarray(0, 5).toString()).toBe('%PDF-');
    const { text } = await pdfText(buf);
    for (const m of plans) {
      expect(text).toContain(m.material);
      m.plan.sheets.forEach((_, i) => expect(text).toContain(`Sheet ${i + 1} of ${m.plan.sheetCount}`));
    }
    const labels = new Set(plans.flatMap((m) => m.plan.sheets.flatMap((s) => s.placements.map((p) => p.label))));
    for (const l of labels) expect(text).toContain(l);
    const cuts = plans.reduce((a, m) => a + m.plan.sheets.reduce((b, s) => b + s.cuts.filter((c) => c.kind === 'trim').length, 0), 0);
    expect(text.match(/\btrim\b/g)?.length ?? 0).toBeGreaterThanOrEqual(cuts);
    expect(text).toContain('eye and hearing protection');
  });
  it('a frame with no bays prints that there is nothing to cut from sheets', async () => {
    const { text } = await pdfText(await sheetPlanPdf(frameSheetPlans({ ...report, bays: [] }), meta));
    expect(text).toContain('no drawers, faces, panels or countertop');
  });
});
