import { crossAxes, type Vec3 } from '../model/axis';
import type { FrameDocument } from '../model/frame-document';
import { roleOf } from '../model/member';
import { ai, cloneBox, overlapOn, type Box } from './box';
import { fitsFreeEnd, fitsJoint, type MethodDef } from './join-methods';
import type { MemberGeometry } from './resolve-members';
import { lowerFirst, memberRef } from './names';
import { SpatialHash } from './spatial-hash';
import type { ReportWarning } from './warnings';

/** Faces closer than this are touching (mm): well below any saw's accuracy, well above float noise. */
export const TOUCH_MM = 0.05;

export type EndName = 'start' | 'end';
export const END_NAMES: readonly EndName[] = ['start', 'end'];

/**
 * - `butt`: an end against another member's face part-way along it (a T); the other runs through.
 * - `corner`: two ends meeting (an L); one runs through to the far side, the other is cut to its face.
 * - `inline`: two members end to end on one line (a splice).
 */
export type JointKind = 'butt' | 'corner' | 'inline';

export type Joint = {
  id: string;
  kind: JointKind;
  butting: number;
  buttingEnd: EndName;
  /** The member it butts against (butt, corner), or the partner (inline). */
  other: number;
  otherEnd: EndName | null;
  through: number | null;
  method: string;
  at: Vec3;
};

/** How a member end finishes: butting into a joint, running through one (its end face open), or free. */
export type EndRole = 'butts' | 'runs-through' | 'free';
export type EndInfo = { role: EndRole; joint: number | null; method: string };

export type JointsResult = { joints: Joint[]; effective: Box[]; ends: [EndInfo, EndInfo][]; warnings: ReportWarning[] };

type Contact = { kind: 'face' | 'corner' | 'inline'; other: number; otherEnd: EndName | null; area: number };

const endCoord = (b: Box, axis: number, end: EndName): number => (end === 'start' ? b.min[axis] : b.max[axis]);

function betterContact(c: Contact, best: Contact | null): boolean {
  if (!best) return true;
  if (Math.abs(c.area - best.area) > 1e-6) return c.area > best.area;
  if ((c.kind === 'inline') !== (best.kind === 'inline')) return best.kind === 'inline';
  return c.other < best.other;
}

/** What each member end touches, found through a spatial hash. Plain loops: this runs for every end on every edit. */
function findContacts(members: readonly MemberGeometry[]): (Contact | null)[][] {
  const n = members.length;
  let largest = 0;
  for (const m of members) largest = Math.max(largest, m.info.profile.width_mm, m.info.profile.height_mm);
  const hash = new SpatialHash(Math.max(100, 2 * largest), n);
  for (let i = 0; i < n; i++) hash.insert(i, members[i].drawn);
  const region: Box = { min: [0, 0, 0], max: [0, 0, 0] };
  const found: number[] = [];
  const out: (Contact | null)[][] = [];
  for (let i = 0; i < n; i++) {
    const m = members[i];
    const mb = m.drawn;
    const a = ai(m.axis);
    const [pa, qa] = crossAxes(m.axis);
    const p = ai(pa);
    const q = ai(qa);
    const ends: (Contact | null)[] = [null, null];
    for (let k = 0; k < 2; k++) {
      const atEnd = k === 1;
      const s = atEnd ? mb.max[a] : mb.min[a];
      for (let c = 0; c < 3; c++) {
        region.min[c] = mb.min[c];
        region.max[c] = mb.max[c];
      }
      region.min[a] = s - TOUCH_MM;
      region.max[a] = s + TOUCH_MM;
      let best: Contact | null = null;
      const count = hash.query(region, found);
      for (let f = 0; f < count; f++) {
        const j = found[f];
        if (j === i) continue;
        const other = members[j];
        const nb = other.drawn;
        const op = overlapOn(mb, nb, p);
        if (op <= TOUCH_MM) continue;
        const oq = overlapOn(mb, nb, q);
        if (oq <= TOUCH_MM) continue;
        if (nb.min[a] > s + TOUCH_MM || nb.max[a] < s - TOUCH_MM) continue;
        const area = op * oq;
        let c: Contact;
        if (other.axis === m.axis) {
          const touching = atEnd ? Math.abs(nb.min[a] - s) <= TOUCH_MM : Math.abs(nb.max[a] - s) <= TOUCH_MM;
          if (!touching) continue;
          c = { kind: 'inline', other: j, otherEnd: atEnd ? 'start' : 'end', area };
        } else {
          // Is one of the other member's ends inside this member's cross-section (a corner) or not (a T)?
          const b = ai(other.axis);
          const lo = mb.min[b] - TOUCH_MM;
          const hi = mb.max[b] + TOUCH_MM;
          const otherEnd: EndName | null = nb.min[b] >= lo && nb.min[b] <= hi ? 'start' : nb.max[b] >= lo && nb.max[b] <= hi ? 'end' : null;
          c = { kind: otherEnd ? 'corner' : 'face', other: j, otherEnd, area };
        }
        if (betterContact(c, best)) best = c;
      }
      ends[k] = best;
    }
    out.push(ends);
  }
  return out;
}

/**
 * Default for which member runs through where two ends meet: an upright, then the longer member, then the one
 * listed first. Uprights running full height with rails between them is the usual way to build (common practice).
 */
function defaultThrough(a: MemberGeometry, b: MemberGeometry): number {
  const ua = roleOf(a.member) === 'upright';
  const ub = roleOf(b.member) === 'upright';
  if (ua !== ub) return ua ? a.index : b.index;
  const la = a.drawn.max[ai(a.axis)] - a.drawn.min[ai(a.axis)];
  const lb = b.drawn.max[ai(b.axis)] - b.drawn.min[ai(b.axis)];
  if (Math.abs(la - lb) > TOUCH_MM) return la > lb ? a.index : b.index;
  return Math.min(a.index, b.index);
}

const pairKey = (a: string, b: string): string => (a < b ? `${a}|${b}` : `${b}|${a}`);

/**
 * Joints from geometry, who runs through at each, the join method, and the members' boxes once butting ends are
 * cut back to the faces they meet (and through ends carried to the far side of a corner).
 */
export function findJoints(
  doc: Pick<FrameDocument, 'joints' | 'settings'>,
  members: readonly MemberGeometry[],
  methods: ReadonlyMap<string, MethodDef>,
): JointsResult {
  const contacts = findContacts(members);
  const throughSetting = new Map(doc.joints.map((j) => [pairKey(j.members[0], j.members[1]), j.through]));
  const byId = new Map(members.map((m) => [m.member.id, m.index]));
  const warnings: ReportWarning[] = [];
  const joints: Joint[] = [];
  const endJoint: (number | null)[][] = members.map(() => [null, null]);
  const taken = new Set<string>();
  const e = (end: EndName) => (end === 'start' ? 0 : 1);
  const methodName = (id: string) => lowerFirst(methods.get(id)?.name ?? 'a join method this frame does not define');

  const defaultJoin = fitsJoint(methods.get(doc.settings.defaultJoin)) ? doc.settings.defaultJoin : 'corner-bracket';
  const jointMethod = (i: number, end: EndName, fallback = defaultJoin): string => {
    const wanted = members[i].member[end]?.join;
    if (wanted === undefined) return fallback;
    if (fitsJoint(methods.get(wanted))) return wanted;
    warnings.push({
      code: 'joint-method-not-for-joints',
      member_id: members[i].member.id,
      message: `${memberRef(members[i].member.id)}, ${end} end: ${methodName(wanted)} is for free ends and this end butts against another member, so ${methodName(fallback)} is used; choose a join method for that end`,
    });
    return fallback;
  };

  const add = (j: Omit<Joint, 'id' | 'at'>) => {
    const id = pairKey(members[j.butting].member.id, members[j.other].member.id);
    taken.add(id);
    endJoint[j.butting][e(j.buttingEnd)] = joints.length;
    if (j.otherEnd && endJoint[j.other][e(j.otherEnd)] === null) endJoint[j.other][e(j.otherEnd)] = joints.length;
    joints.push({ ...j, id, at: { x: 0, y: 0, z: 0 } });
  };

  members.forEach((m, i) => {
    for (const end of END_NAMES) {
      const c = contacts[i][e(end)];
      if (!c || endJoint[i][e(end)] !== null) continue;
      const n = members[c.other];
      const key = pairKey(m.member.id, n.member.id);
      if (taken.has(key)) {
        warnings.push({ code: 'end-shared', member_id: m.member.id, message: `${memberRef(m.member.id)}, ${end} end: already joined to ${memberRef(n.member.id)} elsewhere, so this end is left free; move it so it meets a member it is not yet joined to` });
        continue;
      }
      const back = c.otherEnd ? contacts[c.other][e(c.otherEnd)] : null;
      const mutual = back !== null && back.other === i && back.otherEnd === end;
      const setting = throughSetting.get(key);
      if (c.kind === 'inline') {
        if (!mutual || endJoint[c.other][e(c.otherEnd as EndName)] !== null) {
          warnings.push({ code: 'inline-one-sided', member_id: m.member.id, message: `${memberRef(m.member.id)}, ${end} end: touches the end of ${memberRef(n.member.id)}, which is joined elsewhere, so this end is left free; join the two ends to each other or move one of them` });
          continue;
        }
        // A splice is plated unless either end names its own method.
        const otherEnd = c.otherEnd as EndName;
        const method =
          m.member[end]?.join !== undefined
            ? jointMethod(i, end, 'gusset')
            : n.member[otherEnd]?.join !== undefined
              ? jointMethod(c.other, otherEnd, 'gusset')
              : 'gusset';
        add({ kind: 'inline', butting: i, buttingEnd: end, other: c.other, otherEnd: c.otherEnd, through: null, method });
        continue;
      }
      const otherFree = c.otherEnd !== null && (back === null || mutual) && endJoint[c.other][e(c.otherEnd)] === null;
      if (c.kind === 'corner' && otherFree) {
        const otherEnd = c.otherEnd as EndName;
        // Drawn overlapping, the drawing does not say who runs through; drawn touching, the end against a face butts.
        const through = setting !== undefined ? (byId.get(setting) as number) : mutual ? defaultThrough(m, n) : c.other;
        const butting = through === i ? c.other : i;
        const buttingEnd = butting === i ? end : otherEnd;
        add({
          kind: 'corner',
          butting,
          buttingEnd,
          other: through,
          otherEnd: butting === i ? otherEnd : end,
          through,
          method: jointMethod(butting, buttingEnd),
        });
        continue;
      }
      // The other's end already runs through another corner here (three members at one corner): this is a
      // corner too, with the other running through; anything else is a T.
      const otherJoint = c.otherEnd === null ? null : endJoint[c.other][e(c.otherEnd)];
      const corner = c.kind === 'corner' && otherJoint !== null && joints[otherJoint].through === c.other;
      if (setting !== undefined && setting === m.member.id) {
        warnings.push({
          code: 'through-not-possible',
          member_id: m.member.id,
          message: corner
            ? `${memberRef(m.member.id)} cannot run through ${memberRef(n.member.id)}: that one already runs through another member at this corner; choose which one runs through there instead`
            : `${memberRef(m.member.id)} cannot run through ${memberRef(n.member.id)}: it meets it part-way along, so it butts; clear that choice, or move it to meet the other's end`,
        });
      }
      add({
        kind: corner ? 'corner' : 'butt',
        butting: i,
        buttingEnd: end,
        other: c.other,
        otherEnd: corner ? c.otherEnd : null,
        through: c.other,
        method: jointMethod(i, end),
      });
    }
  });

  // Cut butting ends back to the face they meet; carry through ends across a corner.
  const effective = members.map((m) => cloneBox(m.drawn));
  for (const j of joints) {
    if (j.kind === 'inline' || j.through === null) continue;
    const b = members[j.butting];
    const t = members[j.through];
    const ba = ai(b.axis);
    if (j.kind === 'corner') {
      const ta = ai(t.axis);
      const tEnd = j.otherEnd as EndName;
      if (tEnd === 'end') effective[t.index].max[ta] = Math.max(t.drawn.max[ta], b.drawn.max[ta]);
      else effective[t.index].min[ta] = Math.min(t.drawn.min[ta], b.drawn.min[ta]);
    }
    if (j.buttingEnd === 'end') effective[b.index].max[ba] = t.drawn.min[ba];
    else effective[b.index].min[ba] = t.drawn.max[ba];
  }
  refindStale(members, joints, effective, endJoint, e);
  for (const j of joints) {
    const a = effective[j.butting];
    const b = effective[j.other];
    const mid = (k: number) => (Math.max(a.min[k], b.min[k]) + Math.min(a.max[k], b.max[k])) / 2;
    j.at = { x: mid(0), y: mid(1), z: mid(2) };
  }

  const ends = members.map((m, i) =>
    END_NAMES.map((end): EndInfo => {
      const k = endJoint[i][e(end)];
      const joint = k === null ? null : joints[k];
      const butts = joint !== null &&
        ((joint.butting === i && joint.buttingEnd === end) || (joint.kind === 'inline' && joint.other === i && joint.otherEnd === end));
      if (joint && butts) return { role: 'butts', joint: k, method: joint.method };
      const wanted = m.member[end]?.join;
      let method = 'end-cap';
      if (wanted !== undefined) {
        if (fitsFreeEnd(methods.get(wanted))) method = wanted;
        else if (!joint) {
          warnings.push({
            code: 'free-end-with-joint-method',
            member_id: m.member.id,
            message: `${memberRef(m.member.id)}, ${end} end: set to join by ${methodName(wanted)} but touches no other member, so an end cap is listed instead; move the end onto a member or choose an end treatment`,
          });
        }
      }
      return { role: joint ? 'runs-through' : 'free', joint: k, method };
    }) as [EndInfo, EndInfo],
  );
  return { joints, effective, ends, warnings };
}

/** Does the end of member b (its effective box) lie against member t's effective box? */
function endTouches(members: readonly MemberGeometry[], effective: readonly Box[], b: number, end: EndName, t: number): boolean {
  const m = members[b];
  const a = ai(m.axis);
  const bb = effective[b];
  const tb = effective[t];
  const s = end === 'start' ? bb.min[a] : bb.max[a];
  const [p, q] = crossAxes(m.axis);
  if (overlapOn(bb, tb, ai(p)) <= TOUCH_MM || overlapOn(bb, tb, ai(q)) <= TOUCH_MM) return false;
  return tb.min[a] <= s + TOUCH_MM && tb.max[a] >= s - TOUCH_MM;
}

/**
 * Joints are found on the drawn members; once ends are cut back and carried across corners, a member set to run
 * through can take the place another butting end met (a cross-member drawn against an upright now meets the rail
 * running over the upright's cut-back end). Such a stale joint is re-found on the finished geometry: the end butts
 * into what it now meets, or is left free when it meets nothing.
 */
function refindStale(members: readonly MemberGeometry[], joints: Joint[], effective: Box[], endJoint: (number | null)[][], e: (end: EndName) => number): void {
  for (let k = 0; k < joints.length; k++) {
    const j = joints[k];
    if (j.kind === 'inline' || j.through === null || j.through !== j.other) continue;
    if (endTouches(members, effective, j.butting, j.buttingEnd, j.through)) continue;
    const b = members[j.butting];
    const a = ai(b.axis);
    if (j.otherEnd !== null && endJoint[j.other][e(j.otherEnd)] === k) endJoint[j.other][e(j.otherEnd)] = null;
    // The end as drawn, before it was cut back to the face it no longer meets.
    if (j.buttingEnd === 'end') effective[j.butting].max[a] = b.drawn.max[a];
    else effective[j.butting].min[a] = b.drawn.min[a];
    let best: number | null = null;
    let bestArea = 0;
    for (let t = 0; t < members.length; t++) {
      if (t === j.butting || members[t].axis === b.axis || !endTouches(members, effective, j.butting, j.buttingEnd, t)) continue;
      const [p, q] = crossAxes(b.axis);
      const area = overlapOn(effective[j.butting], effective[t], ai(p)) * overlapOn(effective[j.butting], effective[t], ai(q));
      if (area > bestArea + 1e-9) {
        best = t;
        bestArea = area;
      }
    }
    if (best === null) {
      endJoint[j.butting][e(j.buttingEnd)] = null;
      joints.splice(k, 1);
      for (const list of endJoint) for (let i = 0; i < 2; i++) if (list[i] !== null && (list[i] as number) > k) list[i] = (list[i] as number) - 1;
      k--;
      continue;
    }
    const t = members[best];
    const id = t.member.id < b.member.id ? `${t.member.id}|${b.member.id}` : `${b.member.id}|${t.member.id}`;
    joints[k] = { ...j, id, kind: 'butt', other: best, otherEnd: null, through: best };
    if (j.buttingEnd === 'end') effective[j.butting].max[a] = effective[best].min[a];
    else effective[j.butting].min[a] = effective[best].max[a];
  }
}
