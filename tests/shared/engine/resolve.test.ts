import { describe, expect, it } from 'vitest';
import { profileTable } from '@shared/engine/profile-table';
import { resolveDatums } from '@shared/engine/resolve-datums';
import { resolveMembers } from '@shared/engine/resolve-members';
import { InputError } from '@shared/errors';
import { parseFrameDocument } from '@shared/model/parse';
import { computeReport } from '@shared/engine/report';
import { errorOf } from '../../support/input-error';

const datum = (id: string, from?: string, offset_mm = 0, axis = 'x') => ({ type: 'datum', id, axis, ...(from ? { from } : {}), offset_mm });

describe('datums', () => {
  it('chains offsets and module sizes', () => {
    const doc = parseFrameDocument({
      schemaVersion: 1,
      modules: [{ type: 'module', id: 'cooler', kind: 'appliance', size: { w_mm: 460, d_mm: 400, h_mm: 440 }, mass_kg: 14, bearing: 'base' }],
      datums: [
        datum('a', undefined, 100),
        // bay right = left + cooler width + 2 × 5 mm clearance = 100 + 460 + 10 = 570
        { type: 'datum', id: 'b', axis: 'x', from: 'a', offset_mm: 10, plus: [{ module: 'cooler', size: 'w' }] },
        datum('c', 'b', -20),
      ],
    });
    const { values } = resolveDatums(doc);
    expect(values.get('a')).toBe(100);
    expect(values.get('b')).toBe(570);
    expect(values.get('c')).toBe(550);
  });

  it('rejects a cycle, naming every datum in it', () => {
    const doc = parseFrameDocument({ schemaVersion: 1, datums: [datum('start'), datum('p', 'r', 5), datum('q', 'p', 5), datum('r', 'q', 5)] });
    const e = errorOf(() => resolveDatums(doc));
    expect(e.message).toMatch(/circle/);
    for (const name of ['p', 'q', 'r']) expect(e.message).toContain(name);
    expect(e.message).not.toContain('start');
    expect(e.field).toMatch(/^datums\[[123]\]$/);
    // computeReport reports the same problem
    expect(() => computeReport(doc)).toThrow(InputError);
  });

  it('lays a run out bay by bay: uprights between bays, bays as wide as module + clearance', () => {
    const doc = parseFrameDocument({
      schemaVersion: 1,
      datums: [datum('wall', undefined, 50)],
      modules: [{ type: 'module', id: 'm1', kind: 'appliance', size: { w_mm: 300, d_mm: 400, h_mm: 400 }, mass_kg: 10, bearing: 'base' }],
      runs: [
        {
          type: 'run',
          id: 'run',
          start: { datum: 'wall', offset_mm: 10 },
          upright_mm: 40,
          clearance_mm: 5,
          bays: [{ id: 'b1', module: 'm1' }, { id: 'b2', width_mm: 200 }],
        },
      ],
    });
    const { values, bays } = resolveDatums(doc);
    // u0 = 50 + 10 = 60; b1 = 100 … 100 + 300 + 2 × 5 = 410; u1 = 410; b2 = 450 … 650; u2 = 650; end = 690.
    expect(values.get('run.u0')).toBe(60);
    expect(values.get('b1.start')).toBe(100);
    expect(values.get('b1.end')).toBe(410);
    expect(values.get('b1.mid')).toBe(255);
    expect(values.get('run.u1')).toBe(410);
    expect(values.get('b2.start')).toBe(450);
    expect(values.get('run.u2')).toBe(650);
    expect(values.get('run.end')).toBe(690);
    expect(bays.get('b2')?.width_mm).toBe(200);
  });
});

describe('members', () => {
  const P = (offset_mm: number) => ({ offset_mm });
  it('place against another member face and align by face or centre', () => {
    const doc = parseFrameDocument({
      schemaVersion: 1,
      members: [
        { type: 'member', id: 'U', profile: '40x80-s8', axis: 'z', start: P(0), end: P(700), place: { x: P(100), y: P(0) } },
        // starts at U's right face (x = 100 + 40), 500 long; top flush with U's top; centred on U's depth.
        { type: 'member', id: 'R', profile: '40x40-s8', axis: 'x', start: { member: 'U', face: 'max', offset_mm: 0 }, length_mm: 500, place: { z: { member: 'U', face: 'max', align: 'max', offset_mm: 0 }, y: { offset_mm: 40, align: 'center' } } },
      ],
    });
    const [u, r] = resolveMembers(doc, resolveDatums(doc), profileTable(doc));
    // A 40×80 upright at rotation 0: width (40) along x, height (80) along y.
    expect(u.drawn).toEqual({ min: [100, 0, 0], max: [140, 80, 700] });
    expect(r.drawn).toEqual({ min: [140, 20, 660], max: [640, 60, 700] });
  });

  it('a quarter turn swaps the profile across the member', () => {
    const doc = parseFrameDocument({
      schemaVersion: 1,
      members: [{ type: 'member', id: 'R', profile: '40x80-s8', axis: 'x', rotation_deg: 90, start: P(0), end: P(500) }],
    });
    const [r] = resolveMembers(doc, resolveDatums(doc), profileTable(doc));
    // Rotation 0 would stand it tall (80 along z); a quarter turn lays it flat: 80 along y, 40 along z.
    expect(r.drawn.max).toEqual([500, 80, 40]);
  });

  it('rejects members placed against each other in a circle, naming them', () => {
    const doc = parseFrameDocument({
      schemaVersion: 1,
      members: [
        { type: 'member', id: 'A', profile: '40x40-s8', axis: 'x', start: { member: 'B', face: 'max' }, length_mm: 100 },
        { type: 'member', id: 'B', profile: '40x40-s8', axis: 'x', start: { member: 'A', face: 'max' }, length_mm: 100 },
      ],
    });
    const e = errorOf(() => computeReport(doc));
    expect(e.message).toMatch(/circle/);
    expect(e.message).toContain('A (x)');
    expect(e.message).toContain('B (x)');
  });

  it('rejects a member whose end comes before its start, naming the field', () => {
    const doc = parseFrameDocument({ schemaVersion: 1, members: [{ type: 'member', id: 'A', profile: '40x40-s8', axis: 'x', start: P(300), end: P(200) }] });
    expect(errorOf(() => computeReport(doc)).field).toBe('members[0].end');
  });
});
