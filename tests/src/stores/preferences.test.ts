import { describe, expect, it } from 'vitest';
import { DEFAULT_PREFERENCES, parsePreferences } from '@/stores/preferences';

describe('parsePreferences', () => {
  it('falls back to millimetres and sixteenths when nothing is stored', () => {
    expect(parsePreferences(null)).toEqual({ units: 'mm', fraction: 16, showSheetGoods: true });
    expect(DEFAULT_PREFERENCES.units).toBe('mm');
  });

  it('keeps valid stored values', () => {
    expect(parsePreferences('{"units":"in","fraction":32}')).toEqual({ units: 'in', fraction: 32, showSheetGoods: true });
    expect(parsePreferences('{"showSheetGoods":false}').showSheetGoods).toBe(false);
  });

  it('drops values it does not know and survives damaged JSON', () => {
    expect(parsePreferences('{"units":"cubits","fraction":64,"showSheetGoods":"yes"}')).toEqual({ units: 'mm', fraction: 16, showSheetGoods: true });
    expect(parsePreferences('{not json')).toEqual({ units: 'mm', fraction: 16, showSheetGoods: true });
  });
});
