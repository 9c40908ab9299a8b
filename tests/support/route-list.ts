import type { Express } from 'express';

interface Layer {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/** Every API route the app answers, as "METHOD /api/path", read from Express's own router. */
export function apiRoutes(app: Express): string[] {
  const out = new Set<string>();
  const walk = (stack: Layer[]) => {
    for (const l of stack) {
      if (l.route) {
        for (const [m, on] of Object.entries(l.route.methods)) if (on && m !== '_all') out.add(`${m.toUpperCase()} /api${l.route.path}`);
      } else if (l.handle?.stack) walk(l.handle.stack);
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack);
  return [...out].sort();
}
