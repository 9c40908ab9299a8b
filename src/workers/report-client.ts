// The editor's side of the report worker: one request in flight at a time, the newest document waiting behind it
// (documents in between are never worked out), and answers for anything but the newest document dropped.
import type { FrameReport } from '@shared/engine/report';
import type { FrameDocument } from '@shared/model/frame-document';
import { createReportEngine, type ReportReply, type ReportRequest } from './report-engine';

/** What the client needs of a Worker (a fake one under test). */
export interface ReportPort {
  postMessage(message: ReportRequest): void;
  onmessage: ((e: { data: ReportReply }) => void) | null;
  onerror: ((e: { message?: string }) => void) | null;
  terminate(): void;
}

type ReportWire = Extract<ReportReply, { type: 'report' }>;
/** A report as delivered: `report` is read from its JSON text the first time it is asked for. */
export type ReportAnswer = Omit<ReportWire, 'reportJson'> & { readonly report: FrameReport };
export type ReportFailure = Extract<ReportReply, { type: 'error' }>;

export type ReportClient = {
  /** Ask for the report on `doc` at `revision`; supersedes every earlier request. */
  request(revision: number, doc: FrameDocument, opts?: { reset?: boolean; summarise?: boolean }): void;
  /** Nothing wanted any more (the frame closed): answers still on their way are dropped. */
  cancel(): void;
  /** A request is in flight or waiting. */
  busy(): boolean;
  dispose(): void;
};

export function createReportClient(opts: {
  port: () => ReportPort;
  onReport: (a: ReportAnswer) => void;
  onError: (f: ReportFailure) => void;
}): ReportClient {
  let port: ReportPort | null = null;
  let inFlight: ReportRequest | null = null;
  let waiting: ReportRequest | null = null;
  let latest = -1;

  function send(req: ReportRequest): void {
    if (!port) {
      port = opts.port();
      port.onmessage = (e) => receive(e.data);
      port.onerror = (e) => crashed(e.message);
    }
    inFlight = req;
    port.postMessage(req);
  }

  function next(): void {
    inFlight = null;
    const w = waiting;
    waiting = null;
    if (w) send(w);
  }

  function receive(reply: ReportReply): void {
    const current = reply.revision === latest;
    next();
    if (!current) return;
    if (reply.type === 'report') opts.onReport(answerOf(reply));
    else opts.onError(reply);
  }

  function crashed(message: string | undefined): void {
    const lost = inFlight;
    port?.terminate();
    port = null;
    // The worker's memory of the last report went with it.
    if (waiting) waiting.reset = true;
    next();
    if (lost && lost.revision === latest && !waiting && !inFlight) {
      opts.onError({ type: 'error', revision: lost.revision, message: `The results could not be worked out${message ? `: ${message}` : ''}`, field: null });
    }
  }

  return {
    request(revision, doc, o = {}) {
      latest = revision;
      const req: ReportRequest = { revision, doc, reset: !!o.reset || !!waiting?.reset, summarise: !!o.summarise };
      if (inFlight) waiting = req;
      else send(req);
    },
    cancel() {
      latest = -1;
      waiting = null;
    },
    busy: () => inFlight !== null || waiting !== null,
    dispose() {
      port?.terminate();
      port = null;
      inFlight = null;
      waiting = null;
    },
  };
}

function answerOf(wire: ReportWire): ReportAnswer {
  const { reportJson, ...rest } = wire;
  let report: FrameReport | null = null;
  return {
    ...rest,
    get report() {
      return (report ??= JSON.parse(reportJson) as FrameReport);
    },
  };
}

/** The report engine on this thread, answering after the current task (where Web Workers do not exist). */
export function inProcessPort(): ReportPort {
  const answer = createReportEngine();
  const port: ReportPort = {
    onmessage: null,
    onerror: null,
    postMessage(req) {
      setTimeout(() => port.onmessage?.({ data: answer(req) }), 0);
    },
    terminate() {
      port.onmessage = null;
    },
  };
  return port;
}

/** The report worker when the browser has workers, the in-process engine otherwise. */
export function defaultReportPort(): ReportPort {
  if (typeof Worker === 'undefined') return inProcessPort();
  return new Worker(new URL('./report.worker.ts', import.meta.url), { type: 'module' }) as unknown as ReportPort;
}
