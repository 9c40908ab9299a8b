import { InputError } from '@shared/errors';
import { planCuts } from '@shared/planner';
import { ensureMipSolver } from '../modules/orders/mip';
import type { CutJob } from '@shared/planner/job';
import { readProjectFile } from './project-file.task';
import { compareDocuments, frameReportOf } from './report.task';
import { shopDocument, type ShopDocumentInput } from './shop-document.task';

// The worker threads' entry: CPU-heavy tasks that would otherwise hold the event loop (the stock planner, frames'
// reports for shop documents, orders, cutting and revision compares, pdfmake, reading project files). An InputError
// is sent back as data, since a worker's errors lose their class on the way to the main thread.

export type HeavyTask =
  | { task: 'plan'; job: CutJob; timeLimitMs?: number }
  | { task: 'shopDocument'; input: ShopDocumentInput }
  | { task: 'readProjectFile'; bytes: Uint8Array }
  | { task: 'frameReport'; document: unknown }
  | { task: 'compareRevisions'; before: unknown; after: unknown };

export type HeavyResult<T = unknown> = { ok: true; value: T } | { ok: false; field: string; message: string };

export default async function run(t: HeavyTask): Promise<HeavyResult> {
  try {
    switch (t.task) {
      case 'plan':
        // The same exact solver as the command line and the browser: HiGHS, loaded once per worker thread.
        await ensureMipSolver();
        return { ok: true, value: await planCuts(t.job, { timeLimitMs: t.timeLimitMs }) };
      case 'shopDocument':
        return { ok: true, value: await shopDocument(t.input) };
      case 'readProjectFile':
        return { ok: true, value: readProjectFile(t.bytes) };
      case 'frameReport':
        return { ok: true, value: frameReportOf(t.document) };
      case 'compareRevisions':
        return { ok: true, value: compareDocuments(t.before, t.after) };
    }
  } catch (err) {
    if (err instanceof InputError) return { ok: false, field: err.field, message: err.message };
    throw err;
  }
}
