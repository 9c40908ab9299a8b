import type { MemberRole } from '../model/member';
import type { ReportWarning } from './warnings';

/**
 * How members are named to the builder in messages and listings: the kind of member and its part mark, then the
 * name they gave it, e.g. "rail C (top rail)"; identical parts share a mark, so one with no name says where it is
 * ("cross-member B (at x 480 mm)"). Never the record id, which the builder never typed. A cabinet names
 * its members after the bay they were made for ("Bay 1: bearer, left"); once bays are swapped that number no
 * longer says where the member is, so it is left out.
 */
const ROLE_WORDS: Readonly<Record<MemberRole, string>> = {
  upright: 'upright',
  rail: 'rail',
  'cross-member': 'cross-member',
  brace: 'brace',
  other: 'member',
};

export function memberTitle(m: { role: MemberRole; mark: string; name?: string | null; where?: string }): string {
  const name = m.name?.replace(/^Bay \d+: /, '').trim();
  const head = `${ROLE_WORDS[m.role]} ${m.mark}`;
  return name ? `${head} (${name})` : m.where ? `${head} (${m.where})` : head;
}

/**
 * Stages that run before the part marks exist name a member by this placeholder; the report puts the member's
 * title in its place once the marks are known, so no message ever shows an id.
 */
const OPEN = '\u0001m:';
const CLOSE = '\u0001';
const TOKEN = /\u0001m:([^\u0001]*)\u0001/g;

export const memberRef = (id: string): string => `${OPEN}${id}${CLOSE}`;

/** Puts each member's title in place of its placeholder; an id with no title keeps a neutral word, not the id. */
export function nameMembers(text: string, titleOf: (id: string) => string | undefined): string {
  return text.replace(TOKEN, (_, id: string) => titleOf(id) ?? 'a member');
}

export function nameWarnings(warnings: readonly ReportWarning[], titleOf: (id: string) => string | undefined): ReportWarning[] {
  return warnings.map((w) => ({ ...w, message: nameMembers(w.message, titleOf) }));
}

/** A name used mid-sentence: "Inside corner bracket" → "inside corner bracket". */
export const lowerFirst = (s: string): string => s.charAt(0).toLowerCase() + s.slice(1);
