import { InputError } from '../errors';
import { parseParametric } from './parametric';
import type { Profile } from './profile-types';
import { SLOTTED_PROFILES } from './slotted-profiles';

export type { Fastener, Profile, ProfileKind, Series } from './profile-types';
export type { Outline } from './outlines';
export { sectionOf, type SectionProps } from './section';

/** Shown wherever profile figures are used: our outlines are generic, not any supplier's. */
export const PROFILE_DISCLAIMER =
  'Profile cross-sections are generic approximations drawn for this product, not any supplier’s data. Mass, ' +
  'stiffness and strength differ between suppliers: enter your supplier’s figures where the result matters.';

/** The catalogue of generic slotted profiles, metric first, then inch. Plain sections are not listed. */
export function listProfiles(): Profile[] {
  return [...SLOTTED_PROFILES];
}

/** A catalogue profile by id, or a plain section from `rect:WxH`, `tube:WxHxT`, `angle:AxBxT` (mm). */
export function resolveProfile(id: string): Profile {
  if (typeof id !== 'string' || id.trim() === '') throw new InputError('profile', 'profile: no profile given');
  const found = SLOTTED_PROFILES.find((p) => p.id === id.trim());
  if (found) return found;
  const plain = parseParametric(id);
  if (plain) return plain;
  throw new InputError(
    'profile',
    `profile: "${id}" is not a known profile; use one of ${SLOTTED_PROFILES.map((p) => p.id).join(', ')}, ` +
      'or rect:WxH, tube:WxHxT, angle:AxBxT in millimetres',
  );
}
