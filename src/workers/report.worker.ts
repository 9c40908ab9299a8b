// The engine's full report off the main thread: the editor draws each edit at once and the results follow.
import { createReportEngine, type ReportRequest } from './report-engine';

const answer = createReportEngine();
self.onmessage = (e: MessageEvent<ReportRequest>) => {
  (self as unknown as Worker).postMessage(answer(e.data));
};
