// What the report worker does for each request, kept apart from the worker's plumbing so that it also runs in
// process (where there are no workers) and under test.
import { sceneFromReport } from '@shared/editing/scene-from-report';
import type { Scene } from '@shared/editing/scene';
import { diffReports, type WhatChanged } from '@shared/engine/diff';
import type { FrameReport } from '@shared/engine/report';
import { InputError } from '@shared/errors';
import type { FrameDocument } from '@shared/model/frame-document';
import { reportWithSheetGoods } from '@shared/panels/report-with-goods';
import type { SheetGoods } from '@shared/panels/sheet-goods';

export type ReportRequest = {
  /** Increases with every document the editor applies; answers carry it back so stale ones can be told apart. */
  revision: number;
  doc: FrameDocument;
  /** A frame was opened: forget the last report (it belongs to another frame). */
  reset: boolean;
  /** Also say which parts the change kept, re-cut or added (a re-lay's summary). */
  summarise: boolean;
};

/**
 * The report travels as JSON text: copying one string to the editor's thread is quick, where rebuilding the
 * object graph of a large frame's report (megabytes) there took most of an edit's budget; the editor reads it
 * when it has a moment (see report-client.ts). The scene, which the drawing needs at once, travels as it is.
 */
export type ReportReply =
  | { type: 'report'; revision: number; reportJson: string; scene: Scene; goods: SheetGoods | null; ms: number; changes: WhatChanged | null }
  | { type: 'error'; revision: number; message: string; field: string | null };

/**
 * One engine per frame editor. Part marks come from the document alone (its pinned marks, then first appearance),
 * exactly as the server's saw list and cutting view work them out, so the editor never shows a mark the shop's
 * papers do not; the last report is kept only to say what a change did.
 */
export function createReportEngine(now: () => number = () => performance.now()): (req: ReportRequest) => ReportReply {
  let last: FrameReport | null = null;
  return (req) => {
    if (req.reset) last = null;
    const t0 = now();
    try {
      // With the drawers', panels' and countertop's mass and hardware, as the shop documents have them.
      const { report, goods } = reportWithSheetGoods(req.doc);
      const scene = sceneFromReport(req.doc, report, goods);
      const changes = req.summarise && last ? diffReports(last, report) : null;
      last = report;
      return { type: 'report', revision: req.revision, reportJson: JSON.stringify(report), scene, goods, ms: now() - t0, changes };
    } catch (e) {
      return { type: 'error', revision: req.revision, message: e instanceof Error ? e.message : String(e), field: e instanceof InputError ? e.field : null };
    }
  };
}
