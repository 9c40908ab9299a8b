import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { demoFrameDocument } from '@shared/model/demo-frame';
import { run } from '../../scripts/calc/report';
import { calcCli } from './calc-helpers';

const examples = 'scripts/examples';

describe('calc report', () => {
  it('prints the whole report with its documented top-level fields', async () => {
    const out = await run([`${examples}/workshop-bench.json`]);
    expect(Object.keys(out).sort()).toEqual(
      ['bays', 'cautions', 'cut_list', 'datums', 'hardware', 'joints', 'loads', 'mass', 'members', 'modules', 'name', 'report_version', 'settings', 'units', 'warnings'].sort(),
    );
    expect(out.name).toBe('Workshop bench 1500 × 700');
    // Legs: 900 mm floor to top, by hand.
    expect(out.cut_list.find((c) => c.member_ids.includes('L1'))?.cut_length_mm).toBe(900);
  });

  it('runs from the command line, printing JSON', () => {
    const r = calcCli(['report', `${examples}/rear-kitchen-pod.json`]);
    expect(r.code).toBe(0);
    const json = JSON.parse(r.stdout);
    expect(json.members).toHaveLength(44);
    expect(json.cautions.join(' ')).toMatch(/not an engineering approval/);
  }, 60_000);

  it('with --against, carries the marks over and says what changed', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'calc-report-'));
    const old = demoFrameDocument();
    const wider = { ...old, modules: old.modules.map((m) => (m.id === 'cooler' ? { ...m, size: { ...m.size, w_mm: 500 } } : m)) };
    writeFileSync(join(dir, 'old.json'), JSON.stringify(old));
    writeFileSync(join(dir, 'new.json'), JSON.stringify(wider));
    const out = await run([join(dir, 'new.json'), '--against', join(dir, 'old.json')]);
    expect('what_changed' in out && out.what_changed.totals).toMatchObject({ longer: 4, new_parts: 4 });
  });

  it('exits non-zero naming the bad field', () => {
    const dir = mkdtempSync(join(tmpdir(), 'calc-report-'));
    const bad = demoFrameDocument();
    (bad.members[3] as { profile: string }).profile = 'no-such-profile';
    writeFileSync(join(dir, 'bad.json'), JSON.stringify(bad));
    const r = calcCli(['report', join(dir, 'bad.json')]);
    expect(r.code).not.toBe(0);
    expect(r.stderr).toContain('members[3].profile');
    const missing = calcCli(['report', join(dir, 'none.json')]);
    expect(missing.code).not.toBe(0);
    expect(missing.stderr).toMatch(/cannot read/);
  }, 120_000);
});
