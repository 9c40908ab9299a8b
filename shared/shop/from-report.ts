import type { FrameReport } from '../engine/report-types';
import type { ShopCutList, ShopOp } from './types';

/** The engine's report as the shop documents read it: parts by mark, hardware with spares, slide-in warnings. */
export function shopCutList(report: FrameReport): ShopCutList {
  const names = new Map(report.members.map((m) => [m.id, m.name ?? m.role]));
  return {
    kerf_mm: report.settings.kerf_mm,
    toleranceClass: report.settings.tolerance_standard,
    parts: report.cut_list.map((l) => ({
      mark: l.mark,
      profileId: l.profile,
      profileName: l.profile_name,
      cutLength_mm: l.cut_length_mm,
      qty: l.qty,
      tolerance_mm: l.tolerance_mm,
      ops: l.ops.map(
        (op): ShopOp =>
          op.kind === 'end-tap'
            ? { kind: 'end-tap', end: op.end, thread: op.thread, tapDrill_mm: op.tap_drill_mm, depth_mm: op.depth_mm }
            : { kind: 'access-hole', at_mm: op.at_mm, face: op.face, diameter_mm: op.diameter_mm },
      ),
      members: [...new Set(l.member_ids.map((id) => names.get(id) ?? id))],
    })),
    hardware: report.hardware.lines.map((h) => ({ key: h.key, kind: h.kind, name: shopHardwareName(h), qty: h.count, spares: Math.max(0, h.order_qty - h.count), toBuy: h.order_qty })),
    nutWarnings: report.hardware.t_nut_order.map((t) => ({
      mark: t.mark,
      message: t.message,
      member: names.get(t.member_id) ?? t.member_id,
      face: t.face,
      slot: t.slot,
      count: t.count,
      closedBy: t.closed_by.map((id) => names.get(id) ?? id),
    })),
  };
}

/** A sheet goods line (a drawer slide) keeps its length in the name, as the frame's screws do. */
function shopHardwareName(h: FrameReport['hardware']['lines'][number]): string {
  return h.key.startsWith('goods|') && h.length_mm !== null ? `${h.name}, ${h.length_mm} mm` : h.name;
}
