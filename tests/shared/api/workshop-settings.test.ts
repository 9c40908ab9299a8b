import { describe, expect, it } from 'vitest';
import { DEFAULT_WORKSHOP_SETTINGS, readWorkshopSettings, withWorkshopDefaults, workshopSettingsSchema } from '@shared/api/workshop-settings';
import { parseFrameDocument } from '@shared/model/parse';

const inchShop = workshopSettingsSchema.parse({ units: { length: 'in', frac: 32, mass: 'lb', date: 'dmy' }, kerf_mm: 2.5, trim_mm: 20, minOffcut_mm: 300 });

describe('workshop settings', () => {
  it('defaults: mm, kg, ISO dates, trim 10 mm, shortest offcut 150 mm, 6 m bars', () => {
    expect(DEFAULT_WORKSHOP_SETTINGS.units).toEqual({ length: 'mm', frac: 16, mass: 'kg', date: 'iso', decimalComma: false });
    expect([DEFAULT_WORKSHOP_SETTINGS.trim_mm, DEFAULT_WORKSHOP_SETTINGS.minOffcut_mm]).toEqual([10, 150]);
    expect(DEFAULT_WORKSHOP_SETTINGS.stock).toEqual([{ length_mm: 6000, price: 0 }]);
  });

  it('reads a damaged stored row field by field, keeping what is still valid', () => {
    const r = readWorkshopSettings({ kerf_mm: 99, trim_mm: 25, units: { length: 'in', frac: 32 } });
    expect(r.kerf_mm).toBe(3);
    expect(r.trim_mm).toBe(25);
    expect(r.units.length).toBe('in');
  });

  it('a new frame takes the workshop’s values; what its own document sets wins', () => {
    const blank = parseFrameDocument(withWorkshopDefaults({ schemaVersion: 1 }, inchShop));
    expect(blank.units).toEqual({ display: 'in', frac: 32, mass: 'lb', date: 'dmy', decimalComma: false });
    expect(blank.settings).toMatchObject({ kerf_mm: 2.5, trim_mm: 20, minOffcut_mm: 300 });
    const own = parseFrameDocument(withWorkshopDefaults({ schemaVersion: 1, units: { display: 'mm' }, settings: { kerf_mm: 4 } }, inchShop));
    expect(own.units).toMatchObject({ display: 'mm', frac: 32, mass: 'lb' });
    expect(own.settings).toMatchObject({ kerf_mm: 4, trim_mm: 20 });
  });
});
