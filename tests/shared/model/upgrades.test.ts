import { describe, expect, it } from 'vitest';
import { CURRENT_SCHEMA_VERSION } from '@shared/model/frame-document';
import { parseFrameDocument } from '@shared/model/parse';
import { UPGRADES, upgradeDocument, versionOf } from '@shared/model/upgrades/index';
import { upgradeV0toV1 } from '@shared/model/upgrades/v0-to-v1';

// A synthetic pre-release (version 0) document: no schemaVersion, bare-string units, `settings.kerf`.
const v0 = { name: 'old', units: 'in', settings: { kerf: 2.5, sparesPct: 5 }, members: [] };

describe('document upgrades', () => {
  it('has one step per version up to the current one', () => {
    for (let v = 0; v < CURRENT_SCHEMA_VERSION; v++) expect(typeof UPGRADES[v]).toBe('function');
  });

  it('v0 → v1 names the kerf with its unit and turns units into { display, frac }', () => {
    const v1 = upgradeV0toV1(v0);
    expect(v1).toEqual({ name: 'old', schemaVersion: 1, units: { display: 'in', frac: 16 }, settings: { kerf_mm: 2.5, sparesPct: 5 }, members: [], joinMethods: [], joints: [] });
    expect(v0.settings).toEqual({ kerf: 2.5, sparesPct: 5 }); // the input is left alone
  });

  it('a v0 document reads as a valid current document', () => {
    expect(versionOf(v0)).toBe(0);
    const doc = parseFrameDocument(v0);
    expect(doc.schemaVersion).toBe(CURRENT_SCHEMA_VERSION);
    expect(doc.settings.kerf_mm).toBe(2.5);
    expect(doc.units.display).toBe('in');
  });

  it('leaves a current document as it is', () => {
    const cur = { schemaVersion: CURRENT_SCHEMA_VERSION, name: 'now' };
    expect(upgradeDocument(cur)).toBe(cur);
  });
});
