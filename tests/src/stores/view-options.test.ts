import { describe, expect, it } from 'vitest';
import { DEFAULT_VIEW_OPTIONS, parseViewOptions } from '@/stores/view-options';

describe('parseViewOptions', () => {
  it('draws the sheet goods when nothing is stored', () => {
    expect(parseViewOptions(null)).toEqual({ showSheetGoods: true });
    expect(DEFAULT_VIEW_OPTIONS.showSheetGoods).toBe(true);
  });

  it('keeps a valid stored choice', () => {
    expect(parseViewOptions('{"showSheetGoods":false}').showSheetGoods).toBe(false);
  });

  it('drops values it does not know and survives damaged JSON', () => {
    expect(parseViewOptions('{"showSheetGoods":"yes"}')).toEqual({ showSheetGoods: true });
    expect(parseViewOptions('{not json')).toEqual({ showSheetGoods: true });
  });
});
