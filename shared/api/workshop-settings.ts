import { z } from 'zod';
import { BUILT_IN_JOIN_METHODS } from '../model/join-method';
import { dateFormatSchema, type FrameSettings } from '../model/settings';
import type { FrameDocumentInput } from '../model/frame-document';
import { listProfiles } from '../catalog/profiles';

// A workshop's own defaults: how its figures are read, the saw's kerf, trim and shortest offcut, the load
// check's limits, spares, how members are joined and drawn, and the bars it usually buys. New frames start from
// them; each frame may then set its own (the frame's value wins for that frame).

const PROFILE_IDS = listProfiles().map((p) => p.id);

export const workshopStockLineSchema = z.strictObject({
  length_mm: z.number({ message: 'A length in mm' }).min(100, { message: 'At least 100 mm' }).max(20000, { message: 'At most 20000 mm' }),
  price: z.number({ message: 'A price' }).min(0, { message: 'Must not be negative' }).max(100000, { message: 'At most 100000' }),
});

export const workshopSettingsSchema = z.strictObject({
  units: z
    .strictObject({
      length: z.enum(['mm', 'in'], { message: 'mm or in' }).default('mm'),
      frac: z.union([z.literal(16), z.literal(32)], { message: '16 or 32' }).default(16),
      mass: z.enum(['kg', 'lb'], { message: 'kg or lb' }).default('kg'),
      date: dateFormatSchema.default('iso'),
      decimalComma: z.boolean({ message: 'true or false' }).default(false),
    })
    .prefault({}),
  kerf_mm: z.number({ message: 'A number of mm' }).min(0, { message: 'Must not be negative' }).max(20, { message: 'At most 20 mm' }).default(3),
  trim_mm: z.number({ message: 'A number of mm' }).min(0, { message: 'Must not be negative' }).max(200, { message: 'At most 200 mm' }).default(10),
  minOffcut_mm: z.number({ message: 'A number of mm' }).min(0, { message: 'Must not be negative' }).max(3000, { message: 'At most 3000 mm' }).default(150),
  deflectionLimitN: z.number({ message: 'A number' }).min(10, { message: 'At least 10' }).max(5000, { message: 'At most 5000' }).default(240),
  shockFactor: z.number({ message: 'A number' }).min(1, { message: 'At least 1 (the static load)' }).max(20, { message: 'At most 20' }).default(2.5),
  sparesPct: z.number({ message: 'A percentage' }).min(0, { message: 'Must not be negative' }).max(100, { message: 'At most 100' }).default(10),
  defaultJoin: z.enum(BUILT_IN_JOIN_METHODS, { message: `One of ${BUILT_IN_JOIN_METHODS.join(', ')}` }).default('corner-bracket'),
  defaultProfile: z
    .string()
    .refine((id) => PROFILE_IDS.includes(id), { message: 'Not a profile in the catalogue' })
    .default('40x40-s8'),
  currency: z.string().trim().toUpperCase().regex(/^[A-Z]{3}$/, { message: 'A three-letter currency code such as EUR, GBP or USD' }).default('EUR'),
  stock: z.array(workshopStockLineSchema).max(20, { message: 'At most 20 stock lengths' }).default([{ length_mm: 6000, price: 0 }]),
});
export type WorkshopSettings = z.output<typeof workshopSettingsSchema>;
export type WorkshopSettingsInput = z.input<typeof workshopSettingsSchema>;

export const DEFAULT_WORKSHOP_SETTINGS: WorkshopSettings = workshopSettingsSchema.parse({});

/** GET and PUT /api/workshops/:id/settings. */
export type WorkshopSettingsView = { settings: WorkshopSettings; canEdit: boolean };

/** Reads what is stored, keeping the defaults for anything missing or no longer valid, so nothing saved breaks a read. */
export function readWorkshopSettings(stored: unknown): WorkshopSettings {
  const parsed = workshopSettingsSchema.safeParse(stored ?? {});
  if (parsed.success) return parsed.data;
  const raw = typeof stored === 'object' && stored !== null ? (stored as Record<string, unknown>) : {};
  const out: Record<string, unknown> = {};
  for (const key of Object.keys(workshopSettingsSchema.shape)) {
    const one = workshopSettingsSchema.shape[key as keyof typeof workshopSettingsSchema.shape].safeParse(raw[key]);
    if (one.success) out[key] = one.data;
  }
  return workshopSettingsSchema.parse(out);
}

/** The parts of a frame document a new frame takes from its workshop. */
export function frameDefaults(ws: WorkshopSettings): { units: FrameDocumentInput['units']; settings: Partial<FrameSettings> } {
  return {
    units: { display: ws.units.length, frac: ws.units.frac, mass: ws.units.mass, date: ws.units.date, decimalComma: ws.units.decimalComma },
    settings: {
      kerf_mm: ws.kerf_mm,
      trim_mm: ws.trim_mm,
      minOffcut_mm: ws.minOffcut_mm,
      deflectionLimitN: ws.deflectionLimitN,
      shockFactor: ws.shockFactor,
      sparesPct: ws.sparesPct,
      defaultJoin: ws.defaultJoin,
      defaultProfile: ws.defaultProfile,
    },
  };
}

/**
 * A new frame's document with the workshop's defaults under it: what the caller's document sets itself wins
 * (an imported frame keeps its own kerf), everything it leaves out comes from the workshop.
 */
export function withWorkshopDefaults(document: unknown, ws: WorkshopSettings): unknown {
  if (typeof document !== 'object' || document === null || Array.isArray(document)) return document;
  const d = document as Record<string, unknown>;
  const own = (v: unknown): Record<string, unknown> => (typeof v === 'object' && v !== null && !Array.isArray(v) ? (v as Record<string, unknown>) : {});
  const defaults = frameDefaults(ws);
  if (d.units !== undefined && typeof d.units !== 'object') return document;
  if (d.settings !== undefined && typeof d.settings !== 'object') return document;
  // The workshop fills the settings a document leaves out; the profile to draw in only when it brings no settings at
  // all, since a complete document without one means "the profile the frame uses most".
  const settings = d.settings === undefined ? defaults.settings : { ...defaults.settings, defaultProfile: undefined, ...own(d.settings) };
  if (settings.defaultProfile === undefined) delete settings.defaultProfile;
  return { ...d, units: { ...defaults.units, ...own(d.units) }, settings };
}
