import { computed, ref, shallowRef } from 'vue';
import { defineStore } from 'pinia';
import type { Frame, VersionConflictCurrent } from '@shared/api';
import { applyChange, diffDocuments, isEmptyChange, touchedIds, type Change } from '@shared/editing/change';
import { createHistory } from '@shared/editing/history';
import { emptyScene, type Scene } from '@shared/editing/scene';
import { sceneFromDocument } from '@shared/editing/scene-from-document';
import type { WhatChanged } from '@shared/engine/diff';
import type { FrameReport } from '@shared/engine/report';
import type { SheetGoods } from '@shared/panels/sheet-goods';
import { InputError } from '@shared/errors';
import type { FrameDocument } from '@shared/model/frame-document';
import { parseFrameDocument } from '@shared/model/parse';
import { useApi } from '@/api';
import { createReportClient, defaultReportPort, type ReportAnswer, type ReportFailure } from '@/workers/report-client';
import { dropDraft, keepDraft, loadDraft } from './conflict-drafts';
import { useDocumentSaving } from './document-saving';
import { useNoticesStore } from './notices';

/** Runs `f` when the page is idle (or after 100 ms at the latest); returns a cancel. */
function whenIdle(f: () => void): () => void {
  if (typeof requestIdleCallback === 'function') {
    const id = requestIdleCallback(f, { timeout: 100 });
    return () => cancelIdleCallback(id);
  }
  const id = setTimeout(f, 0);
  return () => clearTimeout(id);
}

export type Selection = { members: readonly string[]; modules: readonly string[] };
const NOTHING: Selection = { members: [], modules: [] };

/** A change the engine refused, with its reason (e.g. a member cut back to nothing). */
export type Refusal = { label: string; message: string; field: string | null };

export type ApplyOptions = {
  /** Show a "what changed" summary of the parts afterwards (swaps and resizes). */
  summarise?: boolean;
  /** Select these afterwards. */
  select?: Selection;
};

/** The engine could not work out the results for the document as it stands (shown until the next report). */
export type EngineError = { message: string; field: string | null };

/**
 * The open frame: its document, the engine's report on it, the selection, and the history. Every edit goes
 * through `apply(change)`: the new document's references are resolved first, and one that cannot be resolved is
 * refused with the reason, leaving the last good one in place. The scene is drawn from the applied document at
 * once; the full report (cut list, hardware, loads, marks) is worked out in a Web Worker and follows, answers for
 * documents since replaced being dropped (see report-client.ts). Saving is in document-saving.ts.
 */
export const useDocumentStore = defineStore('document', () => {
  const api = useApi();
  const notices = useNoticesStore();
  const frameId = ref<string | null>(null);
  const doc = shallowRef<FrameDocument | null>(null);
  const report = shallowRef<FrameReport | null>(null);
  const scene = shallowRef<Scene>(emptyScene());
  /** The drawers, faces, panels and countertop the report sized, with their parts by material. */
  const goods = shallowRef<SheetGoods | null>(null);
  /** The document could not be read at all (it was saved by a newer build, or damaged). */
  const loadError = ref<string | null>(null);
  const readOnly = ref(true);
  const selection = shallowRef<Selection>(NOTHING);
  const refusal = shallowRef<Refusal | null>(null);
  const summary = shallowRef<{ label: string; changes: WhatChanged } | null>(null);
  /** How long the last engine run took (ms): the results panels debounce when it is slow. */
  const engineMs = ref(0);
  /** The report for the document as it stands is still being worked out. */
  const checking = ref(false);
  const engineError = shallowRef<EngineError | null>(null);
  /** The label of the change whose "what changed" summary the next report brings. */
  let summaryLabel: { revision: number; label: string } | null = null;
  /** Bumped on every applied change, so views can watch one number. */
  const revision = ref(0);
  /** The version the frame was opened (or last kept) at: saves since then make leaving keep a revision. */
  let savedAtOpen = 0;

  const history = createHistory();
  const historyTick = ref(0);
  const canUndo = computed(() => (historyTick.value, history.canUndo()));
  const canRedo = computed(() => (historyTick.value, history.canRedo()));
  const undoLabel = computed(() => (historyTick.value, history.undoLabel()));
  const redoLabel = computed(() => (historyTick.value, history.redoLabel()));

  const saving = useDocumentSaving({
    save: (id, baseVersion, document) => api.frames.saveDocument(id, { baseVersion, document: document as unknown as Record<string, unknown> }),
    current: () => (frameId.value && doc.value ? { frameId: frameId.value, doc: doc.value } : null),
    onConflict: (id, baseVersion, document) => {
      if (!keepDraft({ frameId: id, baseVersion, document, keptAt: new Date().toISOString() })) {
        notices.notify('This browser could not keep your unsaved version; download it from the dialog to be safe', 'warning');
      }
    },
  });

  // The scene an answer brings (marks, load colours) is drawn at once; its report, which on a large frame takes a
  // while to read, is taken when the page next has a moment, so the drawing is painted first.
  let arriving: { answer: ReportAnswer; cancel: () => void } | null = null;
  function onReport(a: ReportAnswer): void {
    scene.value = a.scene;
    goods.value = a.goods;
    keepSelectionValid(a.scene);
    arriving?.cancel();
    arriving = { answer: a, cancel: whenIdle(takeReport) };
  }
  function takeReport(): void {
    const a = arriving?.answer;
    arriving = null;
    if (!a) return;
    report.value = a.report;
    engineMs.value = a.ms;
    engineError.value = null;
    // An edit made while this report waited to be read has its own on the way.
    checking.value = reports.busy();
    if (summaryLabel?.revision === a.revision && a.changes) summary.value = { label: summaryLabel.label, changes: a.changes };
    summaryLabel = null;
  }
  function dropArriving(): void {
    arriving?.cancel();
    arriving = null;
  }
  function onEngineError(f: ReportFailure): void {
    // A report still to be taken is on an earlier document: it is the last one that could be checked.
    arriving?.cancel();
    takeReport();
    engineError.value = { message: f.message, field: f.field };
    checking.value = false;
    summaryLabel = null;
  }
  const reports = createReportClient({ port: defaultReportPort, onReport, onError: onEngineError });

  function requestReport(opts: { reset?: boolean; summarise?: boolean } = {}): void {
    if (!doc.value) return;
    checking.value = true;
    reports.request(revision.value, doc.value, opts);
  }

  /** Open a frame as loaded from the server. */
  function open(frame: Frame, canWrite: boolean): void {
    // Going straight from one frame to another: what waits to be saved goes now, for the frame it belongs to.
    if (frameId.value && frameId.value !== frame.id && doc.value && saving.dirty && !saving.conflict) {
      const [id, base, pending] = [frameId.value, saving.baseVersion, doc.value];
      void api.frames.saveDocument(id, { baseVersion: base, document: pending as unknown as Record<string, unknown> }).catch((e: unknown) =>
        notices.notify(`Your last changes to the previous frame were not saved: ${e instanceof Error ? e.message : String(e)}`, 'error'),
      );
    }
    frameId.value = frame.id;
    history.clear();
    historyTick.value++;
    selection.value = NOTHING;
    summary.value = null;
    refusal.value = null;
    report.value = null;
    goods.value = null;
    engineError.value = null;
    summaryLabel = null;
    dropArriving();
    readOnly.value = !canWrite;
    try {
      const parsed = parseFrameDocument(frame.document);
      scene.value = sceneFromDocument(parsed, null);
      doc.value = parsed;
      loadError.value = null;
    } catch (e) {
      doc.value = null;
      scene.value = emptyScene();
      loadError.value = e instanceof Error ? e.message : String(e);
      readOnly.value = true;
    }
    saving.reset(frame.version, doc.value);
    savedAtOpen = frame.version;
    // A draft that lost a save race before the page was left: bring it back with the choice still open.
    const draft = canWrite && doc.value ? loadDraft(frame.id) : null;
    if (draft) {
      try {
        const mine = parseFrameDocument(draft.document);
        scene.value = sceneFromDocument(mine, null);
        doc.value = mine;
        saving.restoreConflict({ version: frame.version, document: frame.document, savedAt: frame.updatedAt, savedBy: frame.updatedBy });
      } catch {
        dropDraft(frame.id);
      }
    }
    revision.value++;
    if (doc.value) requestReport({ reset: true });
    else reports.cancel();
  }

  /**
   * "Save revision": whatever waits is saved, then the version saved is kept as a revision of its own (named, if
   * given). Resolves to false when there is nothing saved to keep (a conflict open, no frame).
   */
  async function keepRevision(name?: string | null): Promise<boolean> {
    const id = frameId.value;
    if (!id || readOnly.value) return false;
    await saving.flush();
    if (saving.conflict || frameId.value !== id) return false;
    await api.frames.keepRevision(id, { baseVersion: saving.baseVersion, name });
    savedAtOpen = saving.baseVersion;
    return true;
  }

  function close(): void {
    const id = frameId.value;
    const edited = id !== null && !readOnly.value && (saving.dirty || saving.baseVersion !== savedAtOpen);
    const flushed = saving.flush();
    // Leaving the editor ends the editing stretch: what was saved in this visit stays as a revision.
    if (edited && id) {
      void flushed.then(() => {
        if (frameId.value !== null || saving.conflict) return;
        return api.frames.keepRevision(id, { baseVersion: saving.baseVersion }).then(
          () => undefined,
          () => undefined,
        );
      });
    }
    frameId.value = null;
    doc.value = null;
    report.value = null;
    goods.value = null;
    reports.cancel();
    dropArriving();
    checking.value = false;
    engineError.value = null;
    scene.value = emptyScene();
    history.clear();
    selection.value = NOTHING;
  }

  function keepSelectionValid(next: Scene): void {
    const members = new Set(next.members.map((m) => m.id));
    const modules = new Set(next.modules.map((m) => m.id));
    const s = selection.value;
    if (s.members.every((id) => members.has(id)) && s.modules.every((id) => modules.has(id))) return;
    selection.value = { members: s.members.filter((id) => members.has(id)), modules: s.modules.filter((id) => modules.has(id)) };
  }

  /** Apply without touching the history (undo, redo and history-merging callers use this). */
  function commit(change: Change, opts: ApplyOptions): boolean {
    if (!doc.value || isEmptyChange(change)) return false;
    const next = applyChange(doc.value, change);
    let drawn: Scene;
    try {
      drawn = sceneFromDocument(next, scene.value);
    } catch (e) {
      if (!(e instanceof InputError)) throw e;
      refusal.value = { label: change.label, message: e.message, field: e.field };
      return false;
    }
    doc.value = next;
    scene.value = drawn;
    refusal.value = null;
    // A summary describes the last re-lay only; any other change makes it stale.
    summary.value = null;
    if (opts.select) selection.value = opts.select;
    keepSelectionValid(drawn);
    revision.value++;
    summaryLabel = opts.summarise ? { revision: revision.value, label: change.label } : null;
    requestReport({ summarise: opts.summarise });
    saving.schedule();
    return true;
  }

  /** The one way to change the document. Returns false when the engine refused it (see `refusal`). */
  function apply(change: Change, opts: ApplyOptions = {}): boolean {
    if (readOnly.value) return false;
    const ok = commit(change, opts);
    if (ok) {
      history.record(change);
      historyTick.value++;
    }
    return ok;
  }

  /** Apply an edit written as document → document. */
  function edit(label: string, f: (d: FrameDocument) => FrameDocument, opts: ApplyOptions = {}): boolean {
    if (!doc.value) return false;
    return apply(diffDocuments(doc.value, f(doc.value), label), opts);
  }

  function undo(): void {
    if (readOnly.value) return;
    const c = history.undo();
    historyTick.value++;
    if (c && !commit(c, { select: selectionAfter(c) })) {
      // The inverse no longer applies cleanly (should not happen); keep the step so nothing is lost.
      history.redo();
      historyTick.value++;
    }
  }

  function redo(): void {
    if (readOnly.value) return;
    const c = history.redo();
    historyTick.value++;
    if (c && !commit(c, { select: selectionAfter(c) })) {
      history.undo();
      historyTick.value++;
    }
  }

  /** After undo or redo, select what the step touched, so the builder sees what came back. */
  function selectionAfter(c: Change): Selection {
    const t = touchedIds(c);
    return { members: [...t.members], modules: [...t.modules] };
  }

  /** Open a group of changes that undo as one (a drag, a dialog's several edits). */
  const beginGesture = () => history.begin();
  const endGesture = (label?: string) => {
    history.end(label);
    historyTick.value++;
  };

  function select(next: Selection): void {
    selection.value = next;
  }
  const clearSelection = () => select(NOTHING);

  /**
   * Someone else saved first. Take theirs: their document replaces ours as one undoable step, so our version is
   * still one undo away (and can be saved on top later).
   */
  function takeTheirs(current: VersionConflictCurrent): void {
    if (!doc.value) return;
    let theirs: FrameDocument;
    try {
      theirs = parseFrameDocument(current.document);
    } catch (e) {
      refusal.value = { label: 'Take their version', message: e instanceof Error ? e.message : String(e), field: null };
      return;
    }
    if (frameId.value) dropDraft(frameId.value);
    saving.adoptVersion(current.version, theirs);
    const change = diffDocuments(doc.value, theirs, 'Take the saved version');
    if (!isEmptyChange(change) && commit(change, {})) {
      history.record(change);
      historyTick.value++;
    }
    // Their document is what the server holds: nothing to save until the next edit.
    saving.markSaved(doc.value);
  }

  /**
   * Keep ours: save it on top of theirs. Theirs is kept as a revision first, even when it was saved under the same
   * account (another tab or device) within the same editing stretch, so it stays in the saved versions.
   */
  function keepMine(current: VersionConflictCurrent): void {
    const id = frameId.value;
    if (id) dropDraft(id);
    saving.adoptVersion(current.version, null);
    const kept = id ? api.frames.keepRevision(id, { baseVersion: current.version }).catch(() => undefined) : Promise.resolve();
    void kept.then(() => saving.schedule(0));
  }

  function dismissSummary(): void {
    summary.value = null;
  }
  /** Show why something the builder asked for was not done (nothing changes). */
  function refuse(label: string, message: string): void {
    refusal.value = { label, message, field: null };
  }
  function dismissRefusal(): void {
    refusal.value = null;
  }

  return {
    frameId,
    doc,
    report,
    goods,
    scene,
    loadError,
    readOnly,
    selection,
    refusal,
    summary,
    engineMs,
    checking,
    engineError,
    revision,
    canUndo,
    canRedo,
    undoLabel,
    redoLabel,
    saving,
    open,
    close,
    keepRevision,
    apply,
    edit,
    undo,
    redo,
    beginGesture,
    endGesture,
    select,
    clearSelection,
    takeTheirs,
    keepMine,
    dismissSummary,
    dismissRefusal,
    refuse,
  };
});
