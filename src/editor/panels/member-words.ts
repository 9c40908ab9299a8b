import type { FrameReport } from '@shared/engine/report';

/**
 * Members as a builder knows them, by report member id: the name they carry (a cabinet's "Bay 1: bearer, left"
 * without the bay, since the module it carries is named beside it) or else "part <mark>", never the record id.
 */
export function memberWords(r: FrameReport): Map<string, { mark: string; label: string }> {
  return new Map(r.members.map((m) => [m.id, { mark: m.mark ?? '', label: m.name?.replace(/^Bay \d+: /, '') || (m.mark ? `part ${m.mark}` : 'a part') }]));
}
