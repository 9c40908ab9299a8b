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
const doc = buildCabinetRun(spec);
const report = computeReport(doc);

describe('printed sheet plan', () => {
  it('a heading per material, a diagram heading per sheet, every cut numbered and every part labelled', async () => {
    const plans = frameSheetPlans(doc, report, 300);
    expect(plans.length).toBeGreaterThan(1);
    const buf = await sheetPlanPdf(plans, meta);
    expect(buf.subarray(0, 5).toString()).toBe('%PDF-');
    const { text } = await pdfText(buf);
    const planned = plans.flatMap((m) => (m.plan ? [m.plan] : []));
    expect(planned).toHaveLength(plans.length);
    for (const m of plans) expect(text).toContain(m.material);
    for (const p of planned) p.sheets.forEach((_, i) => expect(text).toContain(`Sheet ${i + 1} of ${p.sheetCount}`));
    const labels = new Set(planned.flatMap((p) => p.sheets.flatMap((s) => s.placements.map((x) => x.label))));
    for (const l of labels) expect(text).toContain(l);
    const cuts = planned.reduce((a, p) => a + p.sheets.reduce((b, s) => b + s.cuts.filter((c) => c.kind === 'trim').length, 0), 0);
    expect(text.match(/\btrim\b/g)?.length ?? 0).toBeGreaterThanOrEqual(cuts);
    expect(text).toContain('eye and hearing protection');
  });
  it('a countertop longer than the sheet (a 2.6 m run) is listed as not planned, and the rest is still planned', async () => {
    const long = parseCabinetSpec({ ...spec, bays: [...spec.bays, { id: 'bay-extra', width_mm: 900 }] });
    const longDoc = buildCabinetRun(long);
    const plans = frameSheetPlans(longDoc, computeReport(longDoc), 200);
    const top = plans.find((m) => m.oversize.some((o) => o.startsWith('Countertop')));
    expect(top).toBeDefined();
    const { text } = await pdfText(await sheetPlanPdf(plans, meta));
    expect(text).toContain('Larger than the sheet, not planned');
    expect(plans.some((m) => m.plan && m.plan.sheetCount > 0)).toBe(true);
  });
  it('a frame with no bays prints that there is nothing to cut from sheets', async () => {
    const { text } = await pdfText(await sheetPlanPdf(frameSheetPlans(doc, { ...report, bays: [] }), meta));
    expect(text).toContain('no drawers, faces, panels or countertop');
  });
});
