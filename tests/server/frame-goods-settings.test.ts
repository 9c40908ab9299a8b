import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { frameSchema } from '@shared/api/frames';
import { buildCabinetRun, parseCabinetSpec } from '@shared/model/cabinet-run';
import { signedIn, type ApiClient } from '../support/api-client';
import { makeProject, makeUser, makeWorkshop } from '../support/factories';
import { pdfText } from '../support/pdf-text';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

// The builder's drawer-and-sheet choices are saved with the frame and reach the printed sheet plan.
let ctx: TestContext;
let designer: ApiClient;
let projectId: string;

beforeAll(async () => {
  ctx = await createTestContext();
  await truncateAll(ctx.orm);
  const d = await makeUser(ctx.orm);
  const workshop = await makeWorkshop(ctx.orm, [{ user: d, role: 'owner' }]);
  projectId = (await makeProject(ctx.orm, workshop)).id;
  designer = await signedIn(ctx.app, d);
});
afterAll(() => ctx.close());

// The invented side galley of the examples: three bays with drawers, a sink and a countertop.
const galley = () => JSON.parse(JSON.stringify(buildCabinetRun(parseCabinetSpec(JSON.parse(readFileSync(new URL('../../scripts/examples/side-galley-spec.json', import.meta.url), 'utf8'))))));
const pdf = (res: import('supertest').Test) =>
  res.buffer(true).parse((r, cb) => {
    const chunks: Buffer[] = [];
    r.on('data', (x: Buffer) => chunks.push(x));
    r.on('end', () => cb(null, Buffer.concat(chunks)));
  });

describe('sheet-goods choices saved with the frame', () => {
  it('a small sheet saved with the frame reaches the printed sheet plan; the defaults plan every part', async () => {
    const created = frameSchema.parse((await designer.post(`/api/projects/${projectId}/frames`, { name: 'Galley', document: galley() }).expect(201)).body);
    const before = await pdf(designer.get(`/api/frames/${created.id}/shop/sheet-plan.pdf`));
    expect(before.status).toBe(200);
    expect((await pdfText(before.body as Buffer)).text).not.toContain('Larger than the sheet, not planned');

    const doc = { ...created.document, goods: { sheet: { length: 900, width: 600 }, kerf: 4, trim: 5 } };
    const saved = await designer.put(`/api/frames/${created.id}/document`, { baseVersion: created.version, document: doc }).expect(200);
    const read = frameSchema.parse((await designer.get(`/api/frames/${created.id}`).expect(200)).body);
    expect((read.document as { goods?: { slide?: string } }).goods).toMatchObject({ sheet: { length: 900, width: 600 }, kerf: 4, trim: 5, slide: 'side-mount' });
    expect(saved.body.version).toBe(created.version + 1);

    const after = await pdf(designer.get(`/api/frames/${created.id}/shop/sheet-plan.pdf`));
    expect(after.status).toBe(200);
    // The galley's countertop is longer than 900 mm: on these sheets it cannot be planned.
    expect((await pdfText(after.body as Buffer)).text).toMatch(/Larger than the sheet, not planned[^]*Countertop/);
  });

  it('a kerf past its bound is refused naming the field, and the stored frame keeps its choices', async () => {
    const created = frameSchema.parse((await designer.post(`/api/projects/${projectId}/frames`, { name: 'Galley 2', document: { ...galley(), goods: { slide: 'under-mount' } } }).expect(201)).body);
    const res = await designer.put(`/api/frames/${created.id}/document`, { baseVersion: created.version, document: { ...created.document, goods: { kerf: 99 } } });
    expect(res.status).toBe(422);
    expect(Object.keys(res.body.error.fields).join(' ')).toMatch(/document\.goods.*kerf/);
    const read = frameSchema.parse((await designer.get(`/api/frames/${created.id}`).expect(200)).body);
    expect((read.document as { goods?: { slide?: string } }).goods?.slide).toBe('under-mount');
    expect(read.version).toBe(created.version);
  });

  it('a density or a sheet past its bounds is refused naming the field', async () => {
    const dense = await designer.post(`/api/projects/${projectId}/frames`, { name: 'Dense', document: { ...galley(), goods: { densities: { 'birch-18': 5 } } } });
    expect(dense.status).toBe(422);
    expect(Object.keys(dense.body.error.fields).join(' ')).toMatch(/document\.goods\.densities/);
    const huge = await designer.post(`/api/projects/${projectId}/frames`, { name: 'Huge', document: { ...galley(), goods: { sheet: { length: 1e9, width: 1220 } } } });
    expect(huge.status).toBe(422);
    expect(Object.keys(huge.body.error.fields).join(' ')).toMatch(/document\.goods\.sheet/);
  });

  it('an unknown slide type is refused naming the field', async () => {
    const res = await designer.post(`/api/projects/${projectId}/frames`, { name: 'Bad', document: { ...galley(), goods: { slide: 'wooden-runner' } } });
    expect(res.status).toBe(422);
    expect(res.body.error.fields).toHaveProperty(['document.goods.slide']);
  });
});
