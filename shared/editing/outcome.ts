import type { FrameDocument } from '../model/frame-document';
import type { Run } from '../model/run';

/**
 * What an edit that may be refused returns: the new document and the label its undo step gets, or the reason
 * in the builder's words (module and bay names as they see them, never a record id or a document field).
 */
export type EditOutcome<X = object> = ({ ok: true; doc: FrameDocument; label: string } & X) | { ok: false; reason: string };

export const refuse = (reason: string): { ok: false; reason: string } => ({ ok: false, reason });

/** A bay as the builder sees it: its name, else its place in the run ("bay 2"). */
export function bayWords(run: Pick<Run, 'bays'>, index: number): string {
  const name = run.bays[index]?.name?.trim();
  return name ? `“${name}”` : `bay ${index + 1}`;
}

/** A run as the builder sees it. */
export function runWords(run: Pick<Run, 'name'>): string {
  const name = run.name?.trim();
  return name ? `“${name}”` : 'the run';
}

/** "Bay 2" at the start of a sentence. */
export const capital = (s: string): string => (s.startsWith('“') ? s : s.charAt(0).toUpperCase() + s.slice(1));
