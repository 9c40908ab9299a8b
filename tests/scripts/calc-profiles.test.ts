import { describe, expect, it } from 'vitest';
import { listProfiles } from '@shared/catalog/profiles';
import { run } from '../../scripts/calc/profiles';
import { calcCli } from './calc-helpers';

describe('calc profiles', () => {
  it('returns the catalogue ids as an array of strings', async () => {
    const ids = await run([]);
    expect(ids).toEqual(listProfiles().map((p) => p.id));
    expect(ids).toContain('40x40-s8');
    expect(ids).toContain('1.5x3');
  });

  it('rejects arguments', async () => {
    await expect(run(['extra'])).rejects.toThrow(/profiles/);
  });

  it('prints JSON on stdout from the command line', () => {
    const r = calcCli(['profiles']);
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout)).toEqual(listProfiles().map((p) => p.id));
  }, 60_000); // spawns node processes on a shared machine
});
