import { compareReports, type RevisionDiff } from '@shared/engine/revision-diff';
import { parseFrameDocument } from '@shared/model/parse';
import { reportWithSheetGoods } from '@shared/panels/report-with-goods';

// Two revisions' reports compared, in a worker thread: each report is the one the frame's pages show (sheet goods
// included, so masses and hardware agree with them), and on a large frame with bays the four passes take long enough
// to hold every other request back if they ran on the event loop.

export function compareDocuments(before: unknown, after: unknown): RevisionDiff {
  const report = (doc: unknown) => reportWithSheetGoods(parseFrameDocument(doc)).report;
  return compareReports(report(before), report(after));
}
