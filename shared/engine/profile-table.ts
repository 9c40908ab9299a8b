import { resolveProfile, sectionOf, type Fastener, type Profile, type SectionProps } from '../catalog/profiles';
import type { FrameDocument } from '../model/frame-document';

export type ProfileInfo = {
  /** The id members name (a document record's id, or the catalogue / plain-section id). */
  id: string;
  name: string;
  profile: Profile;
  section: SectionProps;
  /** Size of one slot module (20, 30, 40, 45 mm, 1 in…): faces carry one slot per module. */
  module_mm: number;
  /** Whether the faces have T-slots (plain sections have none: fastenings there use through bolts and nuts). */
  slotted: boolean;
};

/**
 * The profiles a document uses, with section properties from the catalogue outline and the document's own
 * figures applied over them (`profiles[]` records, then the frame's alloy setting). Looked up once per id.
 */
export function profileTable(doc: Pick<FrameDocument, 'profiles' | 'settings'>): (id: string) => ProfileInfo {
  const cache = new Map<string, ProfileInfo>();
  return (id: string) => {
    let info = cache.get(id);
    if (info) return info;
    const record = doc.profiles.find((p) => p.id === id);
    const profile = resolveProfile(record?.base ?? id);
    const overrides: Partial<SectionProps> = { ...record?.overrides };
    if (overrides.alloy === undefined && doc.settings.alloy !== undefined) overrides.alloy = doc.settings.alloy;
    info = {
      id,
      name: record?.name ?? profile.name,
      profile,
      section: sectionOf(profile, overrides),
      module_mm: Math.min(profile.width_mm, profile.height_mm),
      slotted: profile.slot_mm !== null && profile.fastener !== null,
    };
    cache.set(id, info);
    return info;
  };
}

/** Plain sections have no fastener of their own; brackets on them are bolted through with this size. */
export const PLAIN_SECTION_FASTENER: Fastener = 'M6';

export const fastenerOf = (p: ProfileInfo): Fastener => p.profile.fastener ?? PLAIN_SECTION_FASTENER;
