import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { InputError } from '@shared/errors';
import { CURRENT_SCHEMA_VERSION, emptyFrameDocument } from '@shared/model/frame-document';
import { frameDocumentIssues, parseFrameDocument } from '@shared/model/parse';

const P = (offset_mm: number) => ({ offset_mm });
const rail = (over: Record<string, unknown> = {}) => ({ type: 'member', id: 'R1', profile: '40x40-s8', axis: 'x', start: P(0), end: P(500), ...over });
const doc = (over: Record<string, unknown> = {}) => ({ schemaVersion: 1, members: [rail()], ...over });

/** The field an InputError names, or a failure if nothing is thrown. */
function fieldOf(fn: () => unknown): string {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(InputError);
    return (e as InputError).field;
  }
  throw new Error('expected an InputError');
}

describe('parseFrameDocument', () => {
  it('fills in the defaults of an empty document', () => {
    const d = parseFrameDocument({ schemaVersion: 1 });
    expect(d).toEqual(emptyFrameDocument());
    expect(d.schemaVersion).toBe(CURRENT_SCHEMA_VERSION);
    // Defaults named in settings.ts: ISO 2768-1 m, kerf 3 mm (REFERENCES.md, common practice), shock 2.5 (2–3 g CP).
    expect(d.settings).toMatchObject({ toleranceClass: 'm', kerf_mm: 3, shockFactor: 2.5, deflectionLimitN: 240, safetyFactor: 1.65 });
    expect(d.units).toEqual({ display: 'mm', frac: 16, mass: 'kg', date: 'iso', decimalComma: false });
  });

  it('accepts its own output (round trip)', () => {
    const d = parseFrameDocument(doc());
    expect(parseFrameDocument(JSON.parse(JSON.stringify(d)))).toEqual(d);
  });

  it('names the field path of a schema error', () => {
    expect(fieldOf(() => parseFrameDocument(doc({ members: [rail({ axis: 'w' })] })))).toBe('members[0].axis');
    expect(fieldOf(() => parseFrameDocument(doc({ members: [rail({ end: undefined })] })))).toBe('members[0].end');
    expect(fieldOf(() => parseFrameDocument(doc({ members: [rail({ start: { offset_mm: 'ten' } })] })))).toBe('members[0].start.offset_mm');
    expect(fieldOf(() => parseFrameDocument(doc({ settings: { kerf_mm: -1 } })))).toBe('settings.kerf_mm');
    expect(
      fieldOf(() =>
        parseFrameDocument(doc({ modules: [{ type: 'module', id: 'm', kind: 'tank', size: { w_mm: 1, d_mm: 1, h_mm: 0 }, mass_kg: 1, bearing: 'base' }] })),
      ),
    ).toBe('modules[0].size.h_mm');
  });

  it('names the field path of a dangling or mismatched reference', () => {
    expect(fieldOf(() => parseFrameDocument(doc({ members: [rail({ start: { datum: 'nowhere' } })] })))).toBe('members[0].start.datum');
    const zDatum = [{ type: 'datum', id: 'top', axis: 'z' }];
    expect(fieldOf(() => parseFrameDocument(doc({ datums: zDatum, members: [rail({ start: { datum: 'top' } })] })))).toBe('members[0].start.datum');
    expect(fieldOf(() => parseFrameDocument(doc({ members: [rail({ profile: '41x41' })] })))).toBe('members[0].profile');
    expect(fieldOf(() => parseFrameDocument(doc({ members: [rail(), rail()] })))).toBe('members[1].id');
    expect(fieldOf(() => parseFrameDocument(doc({ members: [rail({ end: { offset_mm: 10, join: 'glue' } })] })))).toBe('members[0].end.join');
    expect(
      fieldOf(() => parseFrameDocument(doc({ joints: [{ type: 'joint', members: ['R1', 'R9'], through: 'R1' }] }))),
    ).toBe('joints[0].members[1]');
  });

  it('rejects a document newer than this build, naming schemaVersion', () => {
    expect(fieldOf(() => parseFrameDocument({ schemaVersion: CURRENT_SCHEMA_VERSION + 1 }))).toBe('schemaVersion');
    expect(fieldOf(() => parseFrameDocument([]))).toBe('document');
  });

  it('lists every schema problem for a form', () => {
    const issues = frameDocumentIssues(doc({ members: [rail({ axis: 'w', profile: '' })] }));
    expect(issues.map((i) => i.field).sort()).toEqual(['members[0].axis', 'members[0].profile']);
    expect(frameDocumentIssues(doc())).toEqual([]);
  });

  it('reads every example frame', () => {
    for (const f of ['rear-kitchen-pod', 'workshop-bench', 'garage-shelf-inch']) {
      const json = JSON.parse(readFileSync(new URL(`../../../scripts/examples/${f}.json`, import.meta.url), 'utf8'));
      expect(() => parseFrameDocument(json)).not.toThrow();
    }
  });
});
