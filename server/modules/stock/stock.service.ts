import type { EntityManager } from '@mikro-orm/postgresql';
import type { CustomProfileView, ImportResult, Offcut } from '@shared/api/shop';
import { listProfiles } from '@shared/catalog/profiles';
import { parseOffcutsCsv } from '@shared/shop/offcut-import';
import { workshopSettings } from '../workshops/workshop-settings.service';
import { parseProfilesCsv } from '@shared/shop/profile-import';
import { Workshop } from '../workshops/workshop.entity';
import { CustomProfile, type CustomProfileEntity } from './custom-profile.entity';
import { StockOffcut } from './stock-offcut.entity';

const norm = (s: string): string => s.trim().toLowerCase().replace(/[×x*]/g, 'x').replace(/\s+/g, ' ');

/** What a builder may type for a profile: a catalogue id or name, or one of the workshop's own profiles by name. */
export async function profileResolver(em: EntityManager, workshopId: string): Promise<(typed: string) => string | null> {
  const known = new Map<string, string>();
  for (const p of listProfiles()) {
    known.set(norm(p.id), p.id);
    known.set(norm(p.name), p.id);
  }
  for (const c of await em.find(CustomProfile, { workshop: workshopId })) known.set(norm(c.name), `custom:${c.name}`);
  return (typed) => known.get(norm(typed)) ?? null;
}

export async function listOffcuts(em: EntityManager, workshopId: string): Promise<Offcut[]> {
  const rows = await em.find(StockOffcut, { workshop: workshopId }, { orderBy: { profile: 'asc', lengthMm: 'desc' } });
  return rows.map((r) => ({ id: r.id, profile: r.profile, length_mm: Number(r.lengthMm), qty: r.qty, createdAt: r.createdAt.toISOString() }));
}

/** Good rows go on the shelf (in one transaction); bad rows come back with line numbers and reasons. */
export async function importOffcuts(em: EntityManager, workshopId: string, csv: string): Promise<ImportResult> {
  const { units } = await workshopSettings(em, workshopId);
  const parsed = parseOffcutsCsv(csv, await profileResolver(em, workshopId), { bare: units.length, decimalComma: units.decimalComma });
  await em.transactional(async (tx) => {
    for (const r of parsed.rows) tx.create(StockOffcut, { workshop: tx.getReference(Workshop, workshopId), profile: r.value.profileId, lengthMm: r.value.length_mm, qty: r.value.qty });
  });
  return { imported: parsed.rows.length, errors: parsed.errors };
}

export async function deleteOffcut(em: EntityManager, workshopId: string, offcutId: string): Promise<boolean> {
  return (await em.nativeDelete(StockOffcut, { id: offcutId, workshop: workshopId })) > 0;
}

const toProfileView = (c: CustomProfileEntity): CustomProfileView => ({
  id: c.id,
  name: c.name,
  width_mm: Number(c.widthMm),
  height_mm: Number(c.heightMm),
  area_mm2: Number(c.areaMm2),
  Ix_mm4: Number(c.ixMm4),
  Iy_mm4: Number(c.iyMm4),
  Wx_mm3: c.wxMm3 == null ? null : Number(c.wxMm3),
  Wy_mm3: c.wyMm3 == null ? null : Number(c.wyMm3),
  mass_kg_per_m: Number(c.massKgPerM),
});

export async function listCustomProfiles(em: EntityManager, workshopId: string): Promise<CustomProfileView[]> {
  return (await em.find(CustomProfile, { workshop: workshopId }, { orderBy: { name: 'asc' } })).map(toProfileView);
}

/** New names are added, names already in the workshop are updated with the file's figures. */
export async function importCustomProfiles(em: EntityManager, workshopId: string, csv: string): Promise<ImportResult> {
  const parsed = parseProfilesCsv(csv);
  await em.transactional(async (tx) => {
    const existing = new Map((await tx.find(CustomProfile, { workshop: workshopId })).map((c) => [c.name.toLowerCase(), c]));
    for (const { value: v } of parsed.rows) {
      const figures = {
        widthMm: v.width_mm,
        heightMm: v.height_mm,
        areaMm2: v.area_mm2,
        ixMm4: v.Ix_mm4,
        iyMm4: v.Iy_mm4,
        wxMm3: v.Wx_mm3 ?? null,
        wyMm3: v.Wy_mm3 ?? null,
        massKgPerM: v.mass_kg_per_m,
      };
      const c = existing.get(v.name.toLowerCase());
      if (c) tx.assign(c, figures);
      else tx.create(CustomProfile, { workshop: tx.getReference(Workshop, workshopId), name: v.name, ...figures });
    }
  });
  return { imported: parsed.rows.length, errors: parsed.errors };
}
