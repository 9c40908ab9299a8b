import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { applyChange, diffDocuments, invertChange } from '@shared/editing/change';
import { sceneFromReport } from '@shared/editing/scene-from-report';
import { computeReport } from '@shared/engine/report';
import { buildCabinetRun, parseCabinetSpec } from '@shared/model/cabinet-run';
import { frameDocumentSchema } from '@shared/model/frame-document';
import { goodsSettingsOf, goodsSettingsSchema, reportWithSheetGoods, sheetStockOf, withGoodsSettings } from '@shared/panels/index';
import { usualSheetInstead } from '@shared/sheets/from-goods';
import { frameDefaults, workshopSettingsSchema, withWorkshopDefaults } from '@shared/api/workshop-settings';
import { parseFrameDocument } from '@shared/model/parse';

// The example side galley (scripts/examples/side-galley-spec.json, invented): the drawer over the cooler has a
// 420 mm wide opening between the uprights.
const spec = parseCabinetSpec(JSON.parse(readFileSync(new URL('../../../scripts/examples/side-galley-spec.json', import.meta.url), 'utf8')));
const doc = buildCabinetRun(spec);
const cooler = (d: typeof doc) => reportWithSheetGoods(d).goods?.drawers.find((x) => x.opening.module_id === 'cooler-drawer');
const slideLines = (d: typeof doc) => reportWithSheetGoods(d).report.hardware.lines.filter((l) => l.name.startsWith('Drawer slide pair'));

describe('sheet-goods choices kept with the frame', () => {
  it('without choices the report keeps the side-mount default: 420 − 2 × 12.7 = 394.6 mm box (1/2 in a side, common practice, no source)', () => {
    expect(doc.goods).toBeUndefined();
    expect(cooler(doc)?.box.box.width_mm).toBeCloseTo(394.6, 9);
    expect(slideLines(doc).every((l) => l.name.includes('side-mount'))).toBe(true);
  });
  it('under-mount chosen: 420 − 2 × 5/16 in = 404.125 mm box (typical sheet values, from memory), and the hardware list orders under-mount slides', () => {
    const under = { ...doc, goods: goodsSettingsSchema.parse({ slide: 'under-mount' }) };
    expect(cooler(under)?.box.box.width_mm).toBeCloseTo(420 - 2 * 25.4 * (5 / 16), 9);
    const lines = slideLines(under);
    expect(lines.length).toBeGreaterThan(0);
    expect(lines.every((l) => l.name.includes('under-mount'))).toBe(true);
  });
  it('the builder’s own side deduction over the preset resizes the box; a denser sheet makes the report heavier', () => {
    const own = { ...doc, goods: goodsSettingsSchema.parse({ slideValues: { sideDeduction_mm: 20 }, densities: { 'birch-12': 900 } }) };
    expect(cooler(own)?.box.box.width_mm).toBeCloseTo(380, 9);
    expect(reportWithSheetGoods(own).report.mass.total_kg).toBeGreaterThan(reportWithSheetGoods(doc).report.mass.total_kg);
  });
  it('the views draw the box the frame chose: under-mount boxes are wider between the same uprights', () => {
    const under = { ...doc, goods: goodsSettingsSchema.parse({ slide: 'under-mount' }) };
    const drawerWidth = (d: typeof doc) => {
      const b = (sceneFromReport(d, computeReport(d)).goods ?? []).find((g) => g.kind === 'drawer' && g.id.includes('cooler-drawer'));
      expect(b).toBeDefined();
      // The galley runs along x: a drawer box's width is its x extent.
      return b!.box.max[0] - b!.box.min[0];
    };
    expect(drawerWidth(under)).toBeGreaterThan(drawerWidth(doc));
  });
  it('sheets: offcuts on hand come first, the bought sheet last in any number', () => {
    const d = { ...doc, goods: goodsSettingsSchema.parse({ sheet: { length: 2500, width: 1250, price: 60 }, offcuts: [{ length: 800, width: 600, qty: 2 }, { length: 700, width: 500, qty: 0 }], kerf: 2 }) };
    expect(sheetStockOf(d)).toEqual({ sheets: [{ length: 800, width: 600, qty: 2 }, { length: 2500, width: 1250, price: 60, qty: null }], kerf: 2, trim: 10 });
    expect(sheetStockOf(doc).sheets).toEqual([{ length: 2440, width: 1220, qty: null }]);
  });
  it('a stored frame keeps its choices through parsing; out-of-bound values are refused naming the field', () => {
    const json = JSON.parse(JSON.stringify({ ...doc, goods: { slide: 'under-mount', joint: 'dado' } }));
    expect(parseFrameDocument(json).goods).toMatchObject({ slide: 'under-mount', joint: 'dado', faceStyle: 'inset' });
    const bad = frameDocumentSchema.safeParse({ ...json, goods: { kerf: 99 } });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0].path).toEqual(['goods', 'kerf']);
    expect(frameDocumentSchema.safeParse({ ...json, goods: { offcuts: Array.from({ length: 31 }, () => ({ length: 500, width: 500 })) } }).success).toBe(false);
    expect(frameDocumentSchema.safeParse({ ...json, goods: { slideValues: { sideDeduction_mm: 1e9 } } }).success).toBe(false);
  });
  it('a choice is one field change: undo gives back the frame without it', () => {
    const after = { ...doc, goods: goodsSettingsSchema.parse({ slide: 'under-mount' }) };
    const change = diffDocuments(doc, after, 'Slides: under-mount');
    expect(change.ops).toHaveLength(1);
    expect(applyChange(doc, change).goods?.slide).toBe('under-mount');
    expect(applyChange(applyChange(doc, change), invertChange(change)).goods).toBeUndefined();
  });
  describe('the default sheet follows the frame’s length unit', () => {
    // 8 × 4 ft from the international foot, exactly 0.3048 m (international yard and pound agreement, 1959):
    // 8 × 304.8 = 2438.4 mm and 4 × 304.8 = 1219.2 mm. The metric sheet 2440 × 1220 mm is common practice, no source.
    const inchDoc = { ...doc, units: { ...doc.units, display: 'in' as const } };
    it('a frame reading inches plans on 8 × 4 ft = 2438.4 × 1219.2 mm; one reading mm on 2440 × 1220 mm', () => {
      expect(sheetStockOf(inchDoc).sheets).toEqual([{ length: 2438.4, width: 1219.2, qty: null }]);
      expect(goodsSettingsOf(inchDoc).sheet).toEqual({ length: 2438.4, width: 1219.2 });
      expect(goodsSettingsOf(doc).sheet).toEqual({ length: 2440, width: 1220 });
    });
    it('a new frame in an inch workshop takes the inch sheet from the units the workshop gives it', () => {
      const ws = workshopSettingsSchema.parse({ units: { length: 'in', mass: 'lb' } });
      expect(frameDefaults(ws).units?.display).toBe('in');
      const fresh = parseFrameDocument(withWorkshopDefaults({ schemaVersion: 1 }, ws));
      expect(goodsSettingsOf(fresh).sheet).toEqual({ length: 304.8 * 8, width: 304.8 * 4 });
    });
    it('another choice leaves the sheet unset, so it still follows the unit; a sheet set stays as set when the unit changes', () => {
      const chose = withGoodsSettings(inchDoc, { joint: 'dado' });
      expect(chose?.goods?.sheet).toBeUndefined();
      expect(goodsSettingsOf(chose!).sheet.length).toBe(2438.4);
      const set = withGoodsSettings(doc, { sheet: { length: 2440, width: 1220 } })!;
      const nowInches = { ...set, units: { ...set.units, display: 'in' as const } };
      expect(goodsSettingsOf(nowInches).sheet).toEqual({ length: 2440, width: 1220 });
      // …and the usual inch sheet is offered for it, not put in its place.
      expect(usualSheetInstead(goodsSettingsOf(nowInches).sheet, 'in')).toEqual({ length: 2438.4, width: 1219.2 });
      expect(usualSheetInstead({ length: 2500, width: 1250 }, 'in')).toBeNull();
      expect(usualSheetInstead({ length: 2440, width: 1220 }, 'mm')).toBeNull();
    });
    it('a stored frame’s sheet survives parsing unchanged, and one stored without a sheet keeps none', () => {
      const stored = JSON.parse(JSON.stringify({ ...inchDoc, goods: { joint: 'dado', sheet: { length: 2440, width: 1220 } } }));
      expect(parseFrameDocument(stored).goods?.sheet).toEqual({ length: 2440, width: 1220 });
      const bare = JSON.parse(JSON.stringify({ ...inchDoc, goods: { joint: 'dado' } }));
      expect(parseFrameDocument(bare).goods?.sheet).toBeUndefined();
    });
  });
});
