import { describe, expect, it } from 'vitest';
import type { FrameReport } from '@shared/engine/report';
import { reportWithSheetGoods } from '@shared/panels/report-with-goods';
import { demoFrameDocument } from '@shared/model/demo-frame';
import { createReportEngine } from '@/workers/report-engine';
import { resizeModule } from '../../shared/engine/relay-helpers';

describe('the editor’s report engine', () => {
  it('gives every part the mark the server’s saw list and cutting view give it, whatever was edited before', () => {
    const engine = createReportEngine();
    const doc = demoFrameDocument();
    // Merge two groups of bay rails and split them again: marks carried through the edits would drift from a
    // fresh report of the same document, which is all the server has.
    const steps = [doc, resizeModule(doc, 'tank', { w_mm: 460 }), resizeModule(doc, 'tank', { w_mm: 520 })];
    steps.forEach((d, i) => {
      const reply = engine({ revision: i + 1, doc: d, reset: i === 0, summarise: true });
      if (reply.type !== 'report') throw new Error(reply.message);
      // The shop documents' report: the frame with its drawers, panels and countertop.
      const server = reportWithSheetGoods(d).report;
      const report = JSON.parse(reply.reportJson) as FrameReport;
      expect(report.members.map((m) => [m.id, m.mark])).toEqual(server.members.map((m) => [m.id, m.mark]));
      expect(report.cut_list.map((l) => [l.mark, l.cut_length_mm])).toEqual(server.cut_list.map((l) => [l.mark, l.cut_length_mm]));
    });
  });

  it('still says what a change did, part by part', () => {
    const engine = createReportEngine();
    const doc = demoFrameDocument();
    engine({ revision: 1, doc, reset: true, summarise: false });
    const reply = engine({ revision: 2, doc: resizeModule(doc, 'cooler', { w_mm: 500 }), reset: false, summarise: true });
    if (reply.type !== 'report') throw new Error(reply.message);
    expect(reply.changes).not.toBeNull();
    expect(reply.changes!.totals.longer + reply.changes!.totals.shorter).toBeGreaterThan(0);
  });
});
