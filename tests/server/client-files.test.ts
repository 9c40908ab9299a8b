import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { brotliCompressSync, brotliDecompressSync, gunzipSync, gzipSync } from 'node:zlib';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestContext, type TestContext } from '../support/test-app';

// The built client as the server sends it: the precompressed copy the browser accepts (brotli first, then
// gzip, else the plain file), hashed assets cached for a year as immutable, index.html revalidated every time.
// Cache-Control and Content-Encoding semantics: RFC 9111 §5.2 and RFC 9110 §8.4 (immutable: RFC 8246).

let ctx: TestContext;
let dir: string;
const INDEX = '<!doctype html><html><head><script type="module" src="/assets/app-Ab12Cd34.js"></script></head><body><div id="app"></div></body></html>';
const SCRIPT = `export const answer = ${JSON.stringify('x'.repeat(4000))};\n`;

function writeWithCopies(path: string, text: string): void {
  writeFileSync(path, text);
  writeFileSync(`${path}.br`, brotliCompressSync(Buffer.from(text)));
  writeFileSync(`${path}.gz`, gzipSync(Buffer.from(text)));
}

/** The raw bytes of a response, undecoded. */
const raw = (r: request.Test) =>
  r.buffer(true).parse((res, cb) => {
    const chunks: Buffer[] = [];
    res.on('data', (c: Buffer) => chunks.push(c));
    res.on('end', () => cb(null, Buffer.concat(chunks)));
  });

function decode(encoding: string | undefined, body: Buffer): string {
  // The client library may already have decoded gzip; a body that reads as the plain text was.
  const text = body.toString('utf8');
  if (!encoding || text.startsWith('<!doctype') || text.startsWith('export')) return text;
  return (encoding === 'br' ? brotliDecompressSync(body) : gunzipSync(body)).toString('utf8');
}

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'slotwright-client-'));
  mkdirSync(join(dir, 'assets'));
  writeWithCopies(join(dir, 'index.html'), INDEX);
  writeWithCopies(join(dir, 'assets', 'app-Ab12Cd34.js'), SCRIPT);
  ctx = await createTestContext({ SERVE_CLIENT: 'true', CLIENT_DIR: dir });
});
afterAll(async () => {
  await ctx.close();
  rmSync(dir, { recursive: true, force: true });
});

describe('the built client', () => {
  it('sends the brotli copy of a script to a browser that takes brotli, cached for a year as immutable', async () => {
    const res = await raw(request(ctx.app).get('/assets/app-Ab12Cd34.js').set('Accept-Encoding', 'gzip, deflate, br'));
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/javascript/);
    expect(res.headers.vary).toMatch(/Accept-Encoding/i);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(decode('br', res.body as Buffer)).toBe(SCRIPT);
    expect(Number(res.headers['content-length'])).toBeLessThan(SCRIPT.length / 10);
  });

  it('sends the gzip copy when the browser takes only gzip, and the plain file when it takes neither', async () => {
    const gz = await raw(request(ctx.app).get('/assets/app-Ab12Cd34.js').set('Accept-Encoding', 'gzip'));
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(decode('gzip', gz.body as Buffer)).toBe(SCRIPT);
    const plain = await raw(request(ctx.app).get('/assets/app-Ab12Cd34.js').set('Accept-Encoding', 'identity'));
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect((plain.body as Buffer).toString('utf8')).toBe(SCRIPT);
    expect(plain.headers['cache-control']).toBe('public, max-age=31536000, immutable');
  });

  it('asks the browser to check index.html every time, at / and at any page address', async () => {
    for (const path of ['/', '/index.html', '/w/0c9c6b9e/projects/1f2e/frames/3a4b']) {
      const res = await raw(request(ctx.app).get(path).set('Accept-Encoding', 'br, gzip'));
      expect(res.status, path).toBe(200);
      expect(res.headers['cache-control'], path).toBe('no-cache');
      expect(res.headers['content-type'], path).toMatch(/text\/html/);
      expect(decode(res.headers['content-encoding'], res.body as Buffer), path).toBe(INDEX);
    }
  });

  it('answers a hashed file that is not there with 404, not with the page', async () => {
    const res = await request(ctx.app).get('/assets/app-Old00000.js');
    expect(res.status).toBe(404);
  });

  it('leaves the API alone', async () => {
    const res = await request(ctx.app).get('/api/health').set('Accept-Encoding', 'br, gzip');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/json/);
  });
});
