import { InputError } from '../errors';
import { LIMITS } from '../limits';
import { AXES, crossAxes, type Axis } from '../model/axis';
import type { FrameDocument } from '../model/frame-document';
import type { Member } from '../model/member';
import type { Align, Position } from '../model/position';
import { ai, tidy, type Box } from './box';
import type { ProfileInfo } from './profile-table';
import type { ResolvedDatums } from './resolve-datums';

export type MemberGeometry = {
  index: number;
  member: Member;
  info: ProfileInfo;
  axis: Axis;
  /** The box the references put it in, before joints trim or extend its ends. */
  drawn: Box;
};

/**
 * Size of a member's cross-section on a cross axis. At rotation 0 the profile's width lies along the first of
 * `crossAxes(axis)` and its height along the second; a quarter turn swaps them.
 */
export function sizeAcross(m: Pick<Member, 'axis' | 'rotation_deg'>, info: ProfileInfo, axis: Axis): number {
  const [p] = crossAxes(m.axis);
  const turned = m.rotation_deg === 90 || m.rotation_deg === 270;
  const alongP = turned ? info.profile.height_mm : info.profile.width_mm;
  const alongQ = turned ? info.profile.width_mm : info.profile.height_mm;
  return axis === p ? alongP : alongQ;
}

export function alignedLow(v: number, size: number, align: Align | undefined): number {
  switch (align ?? 'min') {
    case 'min':
      return v;
    case 'center':
      return v - size / 2;
    case 'max':
      return v - size;
  }
}

/**
 * The members' boxes from their references. A position may name another member's face, so each (member, axis)
 * pair is resolved after the ones it refers to; a circle of such references is rejected, naming the members.
 */
export function resolveMembers(
  doc: Pick<FrameDocument, 'members'>,
  datums: ResolvedDatums,
  profileOf: (id: string) => ProfileInfo,
): MemberGeometry[] {
  const members = doc.members;
  const n = members.length;
  const index = new Map<string, number>();
  members.forEach((m, i) => index.set(m.id, i));
  const infos = members.map((m) => profileOf(m.profile));
  const lo = new Float64Array(n * 3);
  const hi = new Float64Array(n * 3);
  const state = new Uint8Array(n * 3); // 0 not yet, 1 in progress, 2 done
  const stack: string[] = [];

  const value = (p: Position | undefined, axis: Axis, field: string): number => {
    if (!p) return 0;
    let base = 0;
    if (p.datum !== undefined) {
      const v = datums.values.get(p.datum);
      if (v === undefined) throw new InputError(`${field}.datum`, `${field}.datum: no datum "${p.datum}"`);
      if (datums.axes.get(p.datum) !== axis) {
        throw new InputError(`${field}.datum`, `${field}.datum: datum "${p.datum}" is not on the ${axis} axis`);
      }
      base = v;
    } else if (p.member !== undefined) {
      const j = index.get(p.member);
      if (j === undefined) throw new InputError(`${field}.member`, `${field}.member: no member "${p.member}"`);
      resolve(j, axis);
      base = p.face === 'max' ? hi[j * 3 + ai(axis)] : lo[j * 3 + ai(axis)];
    }
    return base + p.offset_mm;
  };

  function resolve(i: number, axis: Axis): void {
    const k = i * 3 + ai(axis);
    if (state[k] === 2) return;
    const m = members[i];
    if (state[k] === 1) {
      const from = stack.indexOf(`${m.id} (${axis})`);
      const names = [...stack.slice(from), `${m.id} (${axis})`];
      throw new InputError(`members[${i}]`, `members[${i}]: members are placed against each other in a circle: ${names.join(' → ')}`);
    }
    state[k] = 1;
    stack.push(`${m.id} (${axis})`);
    if (axis === m.axis) {
      const s = value(m.start, axis, `members[${i}].start`);
      const e = m.end ? value(m.end, axis, `members[${i}].end`) : s + (m.length_mm as number);
      if (!(e - s > 1e-6)) {
        throw new InputError(
          `members[${i}].end`,
          `members[${i}].end: member "${m.id}" would be ${tidy(e - s)} mm long; its end must lie beyond its start`,
        );
      }
      lo[k] = s;
      hi[k] = e;
    } else {
      const size = sizeAcross(m, infos[i], axis);
      const p = m.place[axis];
      const low = alignedLow(value(p, axis, `members[${i}].place.${axis}`), size, p?.align);
      lo[k] = low;
      hi[k] = low + size;
    }
    stack.pop();
    state[k] = 2;
  }

  const out: MemberGeometry[] = [];
  let total = 0;
  for (let i = 0; i < n; i++) {
    for (const a of AXES) resolve(i, a);
    const b = i * 3;
    checkExtent(members[i], i, lo, hi);
    total += hi[b + ai(members[i].axis)] - lo[b + ai(members[i].axis)];
    if (total > LIMITS.totalLength_mm) {
      throw new InputError('members', `members: together more than ${LIMITS.totalLength_mm / 1e6} km of profile; split the frame`);
    }
    out.push({
      index: i,
      member: members[i],
      info: infos[i],
      axis: members[i].axis,
      drawn: { min: [lo[b], lo[b + 1], lo[b + 2]], max: [hi[b], hi[b + 1], hi[b + 2]] },
    });
  }
  return out;
}

/**
 * Each offset is bounded by the schema, but chains of datums and member faces add them up; past these bounds a
 * document is refused rather than worked on (the spatial hash would otherwise walk millions of cells).
 */
function checkExtent(m: Member, i: number, lo: Float64Array, hi: Float64Array): void {
  for (const a of AXES) {
    const k = i * 3 + ai(a);
    if (!(Math.abs(lo[k]) <= LIMITS.extent_mm && Math.abs(hi[k]) <= LIMITS.extent_mm)) {
      throw new InputError(`members[${i}]`, `members[${i}]: member "${m.id}" lies more than ${LIMITS.extent_mm / 1000} m from the origin on ${a}`);
    }
    if (!(hi[k] - lo[k] <= LIMITS.length_mm)) {
      throw new InputError(`members[${i}]`, `members[${i}]: member "${m.id}" is more than ${LIMITS.length_mm / 1000} m long or wide on ${a}`);
    }
  }
}
