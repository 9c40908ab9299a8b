import { describe, expect, it } from 'vitest';
import { demoFrameDocument } from '@shared/model/demo-frame';
import type { FrameDocument } from '@shared/model/frame-document';
import { createReportClient, type ReportAnswer, type ReportFailure, type ReportPort } from '@/workers/report-client';
import { createReportEngine, type ReportReply, type ReportRequest } from '@/workers/report-engine';

/** A worker that answers only when the test says so, with the real engine. */
function fakeWorker() {
  const engine = createReportEngine();
  const received: ReportRequest[] = [];
  const port: ReportPort = { onmessage: null, onerror: null, postMessage: (m) => void received.push(m), terminate: () => undefined };
  return {
    port,
    received,
    /** Answer the oldest request not yet answered (optionally with a reply of the test's own). */
    answer(reply?: (req: ReportRequest) => ReportReply) {
      const req = received.shift();
      if (!req) throw new Error('nothing was asked');
      port.onmessage?.({ data: reply ? reply(req) : engine(req) });
    },
  };
}

function setUp() {
  const worker = fakeWorker();
  const reports: ReportAnswer[] = [];
  const errors: ReportFailure[] = [];
  const client = createReportClient({ port: () => worker.port, onReport: (a) => reports.push(a), onError: (f) => errors.push(f) });
  return { worker, client, reports, errors };
}

const withCoolerMass = (doc: FrameDocument, kg: number): FrameDocument => ({
  ...doc,
  modules: doc.modules.map((m) => (m.id === 'cooler' ? { ...m, mass_kg: kg } : m)),
});

describe('the report worker client', () => {
  it('keeps one request in flight: an edit applied meanwhile waits, and only its report is delivered', () => {
    const { worker, client, reports } = setUp();
    const doc = demoFrameDocument();
    client.request(1, doc, { reset: true });
    client.request(2, withCoolerMass(doc, 30));
    expect(worker.received.map((r) => r.revision)).toEqual([1]);
    expect(client.busy()).toBe(true);
    worker.answer();
    // Revision 1 was replaced before its answer came: nothing is delivered for it, and revision 2 is sent now.
    expect(reports).toEqual([]);
    expect(worker.received.map((r) => r.revision)).toEqual([2]);
    worker.answer();
    expect(reports.map((r) => r.revision)).toEqual([2]);
    expect(client.busy()).toBe(false);
    // The report is on the document as it stands (the heavier cooler), not on the one before.
    const cooler = reports[0].report.modules.find((m) => m.id === 'cooler')!;
    expect(cooler.mass_kg).toBeGreaterThanOrEqual(30);
  });

  it('never works out a document replaced while it waited, and drops answers for replaced ones', () => {
    const { worker, client, reports } = setUp();
    const doc = demoFrameDocument();
    client.request(1, doc, { reset: true });
    client.request(2, withCoolerMass(doc, 20));
    client.request(3, withCoolerMass(doc, 40));
    worker.answer();
    expect(worker.received.map((r) => r.revision)).toEqual([3]);
    // The frame opened first is forgotten by the worker when the reset travels with the request that replaced it.
    worker.answer();
    expect(reports.map((r) => r.revision)).toEqual([3]);
  });

  it('drops an answer that arrives after the frame was closed', () => {
    const { worker, client, reports, errors } = setUp();
    client.request(1, demoFrameDocument(), { reset: true });
    client.cancel();
    worker.answer();
    expect(reports).toEqual([]);
    expect(errors).toEqual([]);
  });

  it('passes on an engine error for the document as it stands, naming the field', () => {
    const { worker, client, reports, errors } = setUp();
    const doc = demoFrameDocument();
    // A cross-member drawn wholly inside the front upright it meets: the joints cut it back to nothing.
    const inside: FrameDocument = {
      ...doc,
      members: doc.members.map((m) => (m.id === 'galley-x0-top' ? { ...m, start: { datum: 'front', offset_mm: 0 }, end: { datum: 'front', offset_mm: 30 } } : m)),
    };
    client.request(1, inside, { reset: true });
    worker.answer();
    expect(reports).toEqual([]);
    expect(errors).toHaveLength(1);
    expect(errors[0].message).toMatch(/^members\[2\]: the cross-member “[^”]+” is cut back/);
    expect(errors[0].field).toBe('members[2]');
  });

  it('reports a worker that stopped, and starts a fresh one for the next request', () => {
    const ports: ReturnType<typeof fakeWorker>[] = [];
    const errors: ReportFailure[] = [];
    const reports: ReportAnswer[] = [];
    const client = createReportClient({
      port: () => {
        ports.push(fakeWorker());
        return ports[ports.length - 1].port;
      },
      onReport: (a) => reports.push(a),
      onError: (f) => errors.push(f),
    });
    client.request(1, demoFrameDocument(), { reset: true });
    ports[0].port.onerror?.({ message: 'out of memory' });
    expect(errors.map((e) => e.message)).toEqual(['The results could not be worked out: out of memory']);
    client.request(2, demoFrameDocument());
    expect(ports).toHaveLength(2);
    ports[1].answer();
    expect(reports.map((r) => r.revision)).toEqual([2]);
  });

  it('carries a re-lay summary back with the report it belongs to', () => {
    const { worker, client, reports } = setUp();
    const doc = demoFrameDocument();
    client.request(1, doc, { reset: true });
    worker.answer();
    const swapped: FrameDocument = {
      ...doc,
      runs: doc.runs.map((r) => ({ ...r, bays: r.bays.map((b) => (b.module === 'cooler' ? { ...b, module: 'tank' } : b.module === 'tank' ? { ...b, module: 'cooler' } : b)) })),
    };
    client.request(2, swapped, { summarise: true });
    worker.answer();
    expect(reports[1].changes).not.toBeNull();
    expect(reports[0].changes).toBeNull();
  });

  it('delivers the report as the engine sent it, read from its text once, when first asked for', () => {
    const { worker, client, reports } = setUp();
    const doc = demoFrameDocument();
    let sent = '';
    client.request(1, doc, { reset: true });
    worker.answer((req) => {
      const reply = createReportEngine()(req);
      if (reply.type === 'report') sent = reply.reportJson;
      return reply;
    });
    expect(reports).toHaveLength(1);
    const first = reports[0].report;
    // The same object on every read (the panels compare reports by identity), equal to what the engine sent.
    expect(reports[0].report).toBe(first);
    expect(first).toEqual(JSON.parse(sent));
    expect(first.members.map((m) => m.id).sort()).toEqual(doc.members.map((m) => m.id).sort());
  });
});
