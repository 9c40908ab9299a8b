import type { FrameReport } from '@shared/engine/report';
import { compareReports, type RevisionDiff } from '@shared/engine/revision-diff';
import { parseFrameDocument } from '@shared/model/parse';
import { reportWithSheetGoods } from '@shared/panels/report-with-goods';

// A frame's report, and two revisions' reports compared, in a worker thread. Each report is the one the frame's pages
// show (sheet goods included, so masses and hardware agree with them). On a frame of a couple of thousand members a
// report takes about half a second, which on the event loop would hold every other request back.

export function frameReportOf(document: unknown): FrameReport {
  return reportWithSheetGoods(parseFrameDocument(document)).report;
}

export function compareDocuments(before: unknown, after: unknown): RevisionDiff {
  return compareReports(frameReportOf(before), frameReportOf(after));
}
