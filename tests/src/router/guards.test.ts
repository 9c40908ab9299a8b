import { describe, expect, it } from 'vitest';
import { safeReturnPath } from '@/router/guards';

describe('safeReturnPath', () => {
  it('accepts a path on this site', () => {
    expect(safeReturnPath('/w/abc/projects/def')).toBe('/w/abc/projects/def');
  });

  it('refuses other origins and junk', () => {
    expect(safeReturnPath('https://elsewhere.example/')).toBeNull();
    expect(safeReturnPath('//elsewhere.example/')).toBeNull();
    expect(safeReturnPath('/\\elsewhere.example')).toBeNull();
    expect(safeReturnPath(undefined)).toBeNull();
    expect(safeReturnPath(null)).toBeNull();
  });
});
