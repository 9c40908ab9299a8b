import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import type { CuttingState } from '@shared/api/shop';
import { computeReport } from '@shared/engine/report';
import { parseFrameDocument } from '@shared/model/parse';
import { formatLength } from '@shared/geometry/units';
import { ACTORS, demoDocument, MEMBERS, refusal, useShopWorld, type Actor, type ShopWorld } from './shop-world';
import { pdfText } from '../support/pdf-text';

let w: ShopWorld;
useShopWorld((world) => {
  w = world;
});
const c = (a: Actor) => w.clients.get(a)!;
const url = () => `/api/frames/${w.frameId}/cutting`;
const keysOf = (s: CuttingState): string[] => s.session!.plan.plans.flatMap((p) => p.bars.flatMap((b, bi) => b.cuts.map((_, ci) => `${p.profileId}/${bi}/${ci}`)));

const binary = (res: import('supertest').Test) =>
  res.buffer(true).parse((r, cb) => {
    const chunks: Buffer[] = [];
    r.on('data', (d: Buffer) => chunks.push(d));
    r.on('end', () => cb(null, Buffer.concat(chunks)));
  });

describe('cutting at the saw', () => {
  it.each(ACTORS)('%s: reading the cutting state is for members', async (a) => {
    const res = await c(a).get(url());
    expect(res.status).toBe(MEMBERS.includes(a) ? 200 : refusal(a));
    if (res.status === 200) expect(res.body.session).toBeNull();
  });

  it('a viewer cannot start cutting; a cutter can, and the plan covers every part of the frame', async () => {
    expect((await c('viewer').post(url(), {})).status).toBe(403);
    const res = await c('cutter').post(url(), {});
    expect(res.status).toBe(201);
    const s = res.body as CuttingState;
    expect(s.session!.frameVersion).toBe(1);
    expect(s.canTick).toBe(true);
    const report = computeReport(parseFrameDocument(demoDocument()));
    const wanted = report.cut_list.reduce((n, l) => n + l.qty, 0);
    expect(keysOf(s)).toHaveLength(wanted);
    // starting again without asking keeps the same plan
    const again = await c('designer').post(url(), {});
    expect(again.status).toBe(200);
    expect(again.body.session.id).toBe(s.session!.id);
  });

  it('ticks persist, and two cutters see each other’s ticks on reload', async () => {
    const s = (await c('cutter').get(url())).body as CuttingState;
    const [k1, k2] = keysOf(s);
    expect((await c('cutter').post(`${url()}/ticks`, { cutKey: k1 })).status).toBe(200);
    expect((await c('owner').post(`${url()}/ticks`, { cutKey: k2 })).status).toBe(200);
    // the same cut tapped twice is one tick
    expect((await c('owner').post(`${url()}/ticks`, { cutKey: k2 })).status).toBe(200);
    const seen = (await c('cutter').get(url())).body as CuttingState;
    expect(seen.ticks.map((t) => t.cutKey).sort()).toEqual([k1, k2].sort());
    expect(seen.ticks.find((t) => t.cutKey === k2)!.tickedBy!.name).toBe('owner');
  });

  it('a viewer cannot tick or undo; outsiders and anonymous callers neither; unknown cuts are refused', async () => {
    const s = (await c('cutter').get(url())).body as CuttingState;
    const k = keysOf(s)[2];
    expect((await c('viewer').post(`${url()}/ticks`, { cutKey: k })).status).toBe(403);
    expect((await c('outsider').post(`${url()}/ticks`, { cutKey: k })).status).toBe(404);
    expect((await c('anonymous').post(`${url()}/ticks`, { cutKey: k })).status).toBe(401);
    expect((await c('viewer').delete(`${url()}/ticks?cutKey=${encodeURIComponent(keysOf(s)[0])}`)).status).toBe(403);
    const bad = await c('cutter').post(`${url()}/ticks`, { cutKey: 'nope/9/9' });
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields.cutKey).toBeTruthy();
  });

  it('undo removes a tick', async () => {
    const s = (await c('cutter').get(url())).body as CuttingState;
    const k = s.ticks[0].cutKey;
    const res = await c('cutter').delete(`${url()}/ticks?cutKey=${encodeURIComponent(k)}`);
    expect(res.status).toBe(200);
    expect((res.body as CuttingState).ticks.map((t) => t.cutKey)).not.toContain(k);
  });

  it('a cutter can tick but not edit the design', async () => {
    const frame = (await c('cutter').get(`/api/frames/${w.frameId}`)).body;
    const res = await c('cutter').put(`/api/frames/${w.frameId}/document`, { baseVersion: frame.version, document: frame.document });
    expect(res.status).toBe(403);
  });

  it('after a design change, the parts already cut feed the what-changed reuse plan', async () => {
    const before = (await c('cutter').get(url())).body as CuttingState;
    const cutMarks = before.ticks.map((t) => t.mark);
    const frame = (await c('designer').get(`/api/frames/${w.frameId}`)).body;
    const doc = structuredClone(frame.document);
    // Take the last member out: its part is no longer needed, every other part stays as it was.
    doc.members.pop();
    const saved = await c('designer').put(`/api/frames/${w.frameId}/document`, { baseVersion: frame.version, document: doc });
    expect(saved.status).toBe(200);
    const after = (await c('cutter').get(url())).body as CuttingState;
    expect(after.currentVersion).toBe(2);
    expect(after.session!.frameVersion).toBe(1);
    expect(after.reuse).not.toBeNull();
    const reused = after.reuse!.plan.filter((p) => p.action !== 'cut-new').length + after.reuse!.spare.length;
    // every part already cut is either used in the new design or freed for the shelf
    expect(reused).toBeGreaterThanOrEqual(cutMarks.length);
    // only a designer or owner may start cutting over on the new version
    expect((await c('cutter').post(url(), { restart: true })).status).toBe(403);
    const restarted = await c('designer').post(url(), { restart: true });
    expect(restarted.status).toBe(201);
    expect(restarted.body.session.frameVersion).toBe(2);
    expect(restarted.body.ticks).toEqual([]);
  });

  it('the design-changed banner follows what is cut, not the version: a save that cuts nothing new, and an undo, leave it off', async () => {
    const start = (await c('cutter').get(url())).body as CuttingState;
    expect(start.session!.cuttingKey).toBe(start.currentCuttingKey);
    const frame = (await c('designer').get(`/api/frames/${w.frameId}`)).body;
    const saveAs = async (document: unknown, baseVersion: number) =>
      (await c('designer').put(`/api/frames/${w.frameId}/document`, { baseVersion, document }).expect(200)).body.version as number;

    // Renaming a member changes the version but no part.
    const renamed = structuredClone(frame.document);
    renamed.members[0].name = 'Front rail, renamed';
    let v = await saveAs(renamed, frame.version);
    let s = (await c('cutter').get(url())).body as CuttingState;
    expect(s.currentVersion).toBe(frame.version + 1);
    expect(s.currentCuttingKey).toBe(s.session!.cuttingKey);

    // Taking a member out changes what is cut …
    const fewer = structuredClone(frame.document);
    fewer.members.pop();
    v = await saveAs(fewer, v);
    s = (await c('cutter').get(url())).body as CuttingState;
    expect(s.currentCuttingKey).not.toBe(s.session!.cuttingKey);

    // … and putting it back (an undo) gives the same parts again.
    v = await saveAs(frame.document, v);
    s = (await c('cutter').get(url())).body as CuttingState;
    expect(s.currentVersion).toBe(v);
    expect(s.currentCuttingKey).toBe(s.session!.cuttingKey);
  });
});

describe('printed documents and CSV for a frame', () => {
  it('the saw list PDF follows the cutting plan: every cut with its length and mark, and the bar count', async () => {
    const s = (await c('viewer').get(url())).body as CuttingState;
    const res = await binary(c('viewer').get(`/api/frames/${w.frameId}/shop/saw-list.pdf`));
    expect(res.status).toBe(200);
    const { text } = await pdfText(res.body as Buffer);
    const bars = s.session!.plan.plans.flatMap((p) => p.bars);
    const cuts = bars.flatMap((b) => b.cuts);
    // Every length printed: one per cut row, one per leftover row, one per bar heading (its stock length).
    const expected = new Map<string, number>();
    const add = (mm: number) => expected.set(formatLength(mm, 'mm'), (expected.get(formatLength(mm, 'mm')) ?? 0) + 1);
    cuts.forEach((c) => add(c.length_mm));
    bars.forEach((b) => add(b.leftover_mm));
    for (const [len, n] of expected) {
      const escaped = len.replace('.', '\\.');
      const printed = text.match(new RegExp(`(?<![\\d.])${escaped}(?! (stock|offcut from))`, 'g'))?.length ?? 0;
      expect(printed, len).toBe(n);
    }
    expect(text.match(/Bar \d+ of \d+/g)?.length).toBe(bars.length);
    for (const mark of new Set(cuts.map((x) => x.mark))) expect(text).toMatch(new RegExp(`\\b${mark}\\b`));
  });

  it.each(['drill-list.pdf', 'pick-list.pdf', 'labels.pdf', 'sheet-plan.pdf'])('%s renders for a member and is refused to outsiders', async (doc) => {
    const res = await binary(c('cutter').get(`/api/frames/${w.frameId}/shop/${doc}?paper=LETTER&units=in&frac=32`));
    expect(res.status).toBe(200);
    expect((res.body as Buffer).subarray(0, 5).toString()).toBe('%PDF-');
    expect((await c('outsider').get(`/api/frames/${w.frameId}/shop/${doc}`)).status).toBe(404);
  });

  it('the cut-list CSV escapes a member name that looks like a formula', async () => {
    const frame = (await c('designer').get(`/api/frames/${w.frameId}`)).body;
    const doc = structuredClone(frame.document);
    doc.members[0].name = '=HYPERLINK("http://example.test","x")';
    await c('designer').put(`/api/frames/${w.frameId}/document`, { baseVersion: frame.version, document: doc }).expect(200);
    const res = await c('viewer').get(`/api/frames/${w.frameId}/shop/cut-list.csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename=".*cut-list\.csv"/);
    const rows = Papa.parse<string[]>(res.text.replace(/^\uFEFF/, ''), { skipEmptyLines: true }).data;
    const cells = rows.flat();
    expect(cells.some((x) => x.startsWith(`'=HYPERLINK`))).toBe(true);
    expect(cells.some((x) => /^[=+\-@]/.test(x))).toBe(false);
  });

  it('rejects an unknown document name and bad options with the field named', async () => {
    expect((await c('viewer').get(`/api/frames/${w.frameId}/shop/secrets.pdf`)).status).toBe(400);
    const bad = await c('viewer').get(`/api/frames/${w.frameId}/shop/labels.pdf?paper=A3`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.paper).toBeTruthy();
  });
});
