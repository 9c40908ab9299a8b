import type { EntityManager } from '@mikro-orm/postgresql';
import { readWorkshopSettings, type WorkshopSettings } from '@shared/api/workshop-settings';
import { Workshop } from './workshop.entity';

export async function workshopSettings(em: EntityManager, workshopId: string): Promise<WorkshopSettings> {
  const w = await em.findOneOrFail(Workshop, { id: workshopId }, { fields: ['settings'] });
  return readWorkshopSettings(w.settings);
}

export async function saveWorkshopSettings(em: EntityManager, workshopId: string, settings: WorkshopSettings): Promise<WorkshopSettings> {
  await em.nativeUpdate(Workshop, { id: workshopId }, { settings: settings as unknown as Record<string, unknown>, updatedAt: new Date() });
  return settings;
}
