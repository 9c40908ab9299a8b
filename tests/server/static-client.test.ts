import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestContext, type TestContext } from '../support/test-app';

// In production one process serves the built client and the API; client routes fall back to index.html.

let ctx: TestContext;
let dir: string;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'slotwright-client-'));
  mkdirSync(join(dir, 'assets'));
  writeFileSync(join(dir, 'index.html'), '<!doctype html><title>Slotwright</title><div id="app"></div>');
  writeFileSync(join(dir, 'assets', 'main.js'), 'console.log("client")');
  ctx = await createTestContext({ SERVE_CLIENT: 'true', CLIENT_DIR: dir });
});
afterAll(async () => {
  await ctx.close();
  rmSync(dir, { recursive: true, force: true });
});

describe('serving the built client', () => {
  it('serves index.html at / and for client routes', async () => {
    for (const path of ['/', '/workshops/123/projects', '/frames/abc']) {
      const res = await request(ctx.app).get(path).expect(200);
      expect(res.headers['content-type']).toMatch(/text\/html/);
      expect(res.text).toContain('<div id="app">');
    }
  });

  it('serves assets as files', async () => {
    const res = await request(ctx.app).get('/assets/main.js').expect(200);
    expect(res.headers['content-type']).toMatch(/javascript/);
  });

  it('leaves /api to the API: unknown API routes are JSON 404s, not the page', async () => {
    const res = await request(ctx.app).get('/api/not-a-route').expect(404);
    expect(res.body.error.code).toBe('not_found');
    await request(ctx.app).get('/api/health').expect(200);
  });
});
