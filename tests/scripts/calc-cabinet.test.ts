import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { computeReport } from '@shared/engine/report';
import { parseFrameDocument } from '@shared/model/parse';
import { run as cabinet } from '../../scripts/calc/cabinet';
import { run as swap } from '../../scripts/calc/swap';
import { calcCli } from './calc-helpers';

const SPEC = 'scripts/examples/side-galley-spec.json';
const dir = mkdtempSync(join(tmpdir(), 'calc-cabinet-'));
const root = fileURLToPath(new URL('../..', import.meta.url));

describe('calc cabinet', () => {
  it('prints a frame document for the example layout, with every module seated', async () => {
    const doc = parseFrameDocument(await cabinet([SPEC]));
    const spec = JSON.parse(readFileSync(SPEC, 'utf8'));
    expect(doc.name).toBe(spec.name);
    expect(doc.runs[0].bays.map((b) => b.id)).toEqual(spec.bays.map((b: { id: string }) => b.id));
    const r = computeReport(doc);
    for (const m of r.modules) expect(m.bears_on.length).toBeGreaterThan(0);
    expect(r.warnings.filter((w) => w.code === 'module-unsupported')).toEqual([]);
  });

  it('names the bad field', async () => {
    const spec = JSON.parse(readFileSync(SPEC, 'utf8'));
    spec.bays[1].stack[0].size.h_mm = -5;
    const f = join(dir, 'bad.json');
    writeFileSync(f, JSON.stringify(spec));
    await expect(cabinet([f])).rejects.toThrow(/bays\[1\]\.stack\[0\]\.size\.h_mm: must be more than 0/);
    spec.bays[1].stack[0].size.h_mm = 100;
    spec.bays[2].module.id = 'cooler';
    writeFileSync(f, JSON.stringify(spec));
    await expect(cabinet([f])).rejects.toThrow(/bays\[2\]\.module\.id: "cooler" is already used/);
    await expect(cabinet([join(dir, 'none.json')])).rejects.toThrow(/SPEC\.json: cannot read/);
  });
});

describe('calc swap', () => {
  it('swaps two bays and prints the re-laid document; twice gives the document back', async () => {
    const f = join(dir, 'galley.json');
    const doc = await cabinet([SPEC]);
    writeFileSync(f, JSON.stringify(doc));
    const once = await swap([f, 'cooler', 'tank']);
    expect(once.runs[0].bays.map((b) => b.module)).toEqual(['tank', 'drawer-low', 'cooler', undefined]);
    const g = join(dir, 'once.json');
    writeFileSync(g, JSON.stringify(once));
    expect(await swap([g, 'tank', 'cooler'])).toEqual(doc);
  });

  it('names the missing module and says in words why a swap cannot be done', async () => {
    const f = join(dir, 'galley2.json');
    writeFileSync(f, JSON.stringify(await cabinet([SPEC])));
    await expect(swap([f, 'cooler', 'fridge'])).rejects.toThrow(/MODULE_B: no module "fridge"/);
    await expect(swap([f, 'cooler', 'cooler'])).rejects.toThrow(/cannot swap: Pick two different modules to swap; both picks are “Compressor cooler”/);
  });
});

describe('every command’s output arrives whole through a slow pipe', () => {
  it('parses as JSON after passing through a reader that waits before reading', () => {
    const job = join(dir, 'job.json');
    writeFileSync(job, JSON.stringify({ kerf: 3, stock: [{ length: 3000 }], parts: [{ length: 1000, qty: 2, label: 'P' }] }));
    const galley = join(dir, 'galley3.json');
    const commands: Record<string, string> = {
      profiles: 'profiles',
      section: 'section 40x40-s8',
      beam: "beam --profile 40x40-s8 --span '1 m' --load '500 N'",
      length: "length '29 1/2 in'",
      report: 'report scripts/examples/rear-kitchen-pod.json',
      cut: `cut ${job}`,
      cabinet: `cabinet ${SPEC}`,
      swap: `swap ${galley} cooler tank`,
    };
    // The reader sleeps first, so the 64 KiB pipe buffer fills while the command is still writing: a process that
    // exits without waiting for stdout to drain loses the rest (the report is about 128 KB).
    const tsx = 'node_modules/.bin/tsx scripts/calc.ts';
    // All at once (each is a separate process), then wait: a failing command is listed in `failed`.
    const failed = join(dir, 'failed');
    const script = [
      `${tsx} cabinet ${SPEC} > ${galley}`,
      `: > ${failed}`,
      ...Object.entries(commands).map(([name, args]) => `{ ${tsx} ${args} | (sleep 1; cat) > ${join(dir, `${name}.out`)} || echo ${name} >> ${failed}; } &`),
      'wait',
    ].join('\n');
    const r = spawnSync('sh', ['-c', script], { cwd: root, encoding: 'utf8', timeout: 240_000 });
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    expect(readFileSync(failed, 'utf8')).toBe('');
    for (const name of Object.keys(commands)) {
      const text = readFileSync(join(dir, `${name}.out`), 'utf8');
      expect(() => JSON.parse(text), name).not.toThrow();
    }
    expect(readFileSync(join(dir, 'report.out'), 'utf8').length).toBeGreaterThan(65_536);
  }, 240_000);

  it('exits non-zero with the field on stderr from the command line', () => {
    const r = calcCli(['cabinet', join(dir, 'none.json')]);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/SPEC\.json: cannot read/);
  }, 60_000);
});
