// A frame's own sheet-goods choices turned into what the sizing and the sheet planner take, so the editor, the
// report worker and the shop documents all read the same ones.
import type { FrameDocument } from '../model/frame-document';
import { defaultSheetFor, type SheetStock } from '../sheets/from-goods';
import { goodsSettingsSchema, type GoodsSettings } from './goods-settings';
import type { SheetMaterial } from './materials';
import { defaultSheetGoodsOptions, type SheetGoodsOptions } from './sheet-goods';
import { slidePreset } from './slides';

/** What the sheet-goods choices read: the frame's document, or only the parts of it they depend on. */
export type GoodsSource = { goods?: FrameDocument['goods']; units?: { display: 'mm' | 'in' } };

/** The settings with every default in place, the sheet included. */
export type ResolvedGoodsSettings = GoodsSettings & { sheet: SheetStock };

/** The frame's settings, or the defaults where it has none; a sheet it never set is its length unit's usual one. */
export function goodsSettingsOf(doc: GoodsSource): ResolvedGoodsSettings {
  const s = doc.goods ?? goodsSettingsSchema.parse({});
  return { ...s, sheet: s.sheet ?? defaultSheetFor(doc.units?.display ?? 'mm') };
}

export function goodsOptionsOf(doc: GoodsSource): SheetGoodsOptions {
  const s = goodsSettingsOf(doc);
  const d = defaultSheetGoodsOptions();
  const own = (m: SheetMaterial): SheetMaterial => (s.densities[m.id] ? { ...m, density_kg_m3: s.densities[m.id], typical: false } : m);
  return {
    ...d,
    slide: { ...slidePreset(s.slide, s.series), ...s.slideValues },
    joint: s.joint,
    faceStyle: s.faceStyle,
    panelMount: s.panelMount,
    box: own(d.box),
    bottom: own(d.bottom),
    face: own(d.face),
    panel: own(d.panel),
    top: own(d.top),
  };
}

/** Offcuts on hand first and free, so a plan takes them before buying; then as many bought sheets as needed. */
export function sheetStockOf(doc: GoodsSource): { sheets: SheetStock[]; kerf: number; trim: number } {
  const s = goodsSettingsOf(doc);
  return { sheets: [...s.offcuts.filter((o) => (o.qty ?? 0) > 0), { ...s.sheet, qty: null }], kerf: s.kerf, trim: s.trim };
}

/**
 * The frame with some of its sheet-goods choices replaced; null when a value is out of its bounds (the frame keeps
 * the last good one). A new slide type starts again from its preset, so the old type's values do not carry over.
 */
export function withGoodsSettings<D extends GoodsSource>(doc: D, patch: Partial<GoodsSettings>): D | null {
  // From what is stored, not the resolved defaults: a sheet the builder never set keeps following the frame's unit.
  const was = doc.goods ?? goodsSettingsSchema.parse({});
  const next = { ...was, ...(patch.slide && patch.slide !== was.slide ? { slideValues: {} } : {}), ...patch };
  const ok = goodsSettingsSchema.safeParse(next);
  return ok.success ? { ...doc, goods: ok.data } : null;
}
