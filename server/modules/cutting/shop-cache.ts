import { createHash } from 'node:crypto';
import { LRUCache } from 'lru-cache';

// Each shop document of a frame, kept per (workshop, frame, version, settings) and reused until the frame
// changes: a new version is a new key, so nothing needs clearing and old entries age out. The caller checks
// access before asking, and the key holds the workshop and frame, so an entry answers only for the frame
// (and the facts printed on it) it was made from.

export type ShopFile = { body: Buffer | string; type: string; filename: string };

const MB = 1024 * 1024;

export function createShopCache() {
  const files = new LRUCache<string, ShopFile>({
    maxSize: 64 * MB,
    sizeCalculation: (f) => Math.max(1, typeof f.body === 'string' ? f.body.length * 2 : f.body.length),
  });
  return {
    async file(frame: { workshopId: string; id: string; version: number }, settings: unknown, make: () => Promise<ShopFile>): Promise<{ file: ShopFile; hit: boolean }> {
      const key = `${frame.workshopId}/${frame.id}/${frame.version}/${createHash('sha256').update(JSON.stringify(settings)).digest('base64url')}`;
      const hit = files.get(key);
      if (hit) return { file: hit, hit: true };
      const file = await make();
      files.set(key, file);
      return { file, hit: false };
    },
  };
}
export type ShopCache = ReturnType<typeof createShopCache>;
