import { z } from 'zod';
import { resolveProfile } from '../catalog/profiles';
import { InputError } from '../errors';
import type { DatumInput } from './datum';
import { CURRENT_SCHEMA_VERSION, frameDocumentSchema, type FrameDocument, type FrameDocumentInput } from './frame-document';
import { idSchema, nameSchema } from './ids';
import type { MemberInput } from './member';
import { bearingSchema, DEFAULT_SIDE_GAP_MM, MAX_OPTIONS, moduleKindSchema, moduleOptionSchema, type ModuleInput } from './module';
import type { PositionInput } from './position';
import { fieldPath } from './references';
import { MAX_STACK } from './run';

/** Bounds on a cabinet layout's figures (mm, kg): far beyond any cabinet, they only keep nonsense out. */
const LEN_MAX = 10_000;
const MASS_MAX = 5_000;
/** Most bays one layout may have. */
export const MAX_BAYS = 40;

const len = (what: string) => z.number({ error: `${what} must be a number of millimetres` }).positive('must be more than 0').max(LEN_MAX, `must be at most ${LEN_MAX} mm`);
const lenOrZero = (what: string) => z.number({ error: `${what} must be a number of millimetres` }).nonnegative('must not be negative').max(LEN_MAX, `must be at most ${LEN_MAX} mm`);
const kg = z.number({ error: 'must be a number of kilograms' }).nonnegative('must not be negative').max(MASS_MAX, `must be at most ${MASS_MAX} kg`);

/** A module as a cabinet layout holds it, in its bay. */
export const cabinetModuleSchema = z.strictObject({
  id: idSchema,
  name: nameSchema,
  kind: moduleKindSchema,
  /** `base` sits on bearers, `hung` hangs from hangers under the top, `side-rails` runs on a rail either side. */
  bearing: bearingSchema,
  size: z.strictObject({ w_mm: len('width'), d_mm: len('depth'), h_mm: len('height') }),
  mass_kg: kg,
  contents_kg: kg.optional(),
  litres: z.number().nonnegative('must not be negative').max(MASS_MAX, `must be at most ${MASS_MAX} L`).optional(),
  /**
   * The bottom module of a bay: the height of its base above the seat. A stacked module: the room between the top
   * of the module below and its own base (by default the clearance, plus a profile's thickness for the rails a
   * module that sits needs under it).
   */
  raise_mm: lenOrZero('raise').optional(),
  options: z.array(moduleOptionSchema).max(MAX_OPTIONS, `at most ${MAX_OPTIONS} options`).optional(),
});
export type CabinetModule = z.output<typeof cabinetModuleSchema>;

export const cabinetBaySchema = z
  .strictObject({
    id: idSchema,
    module: cabinetModuleSchema.optional(),
    width_mm: len('width').optional(),
    clearance_mm: lenOrZero('clearance').optional(),
    /** Modules above `module` (or above the seat of an open bay), bottom to top. */
    stack: z.array(cabinetModuleSchema).max(MAX_STACK, `a bay stacks at most ${MAX_STACK} modules`).optional(),
  })
  .superRefine((b, ctx) => {
    if (b.module === undefined && b.width_mm === undefined && !(b.stack && b.stack.length > 0)) {
      ctx.addIssue({ code: 'custom', path: ['width_mm'], message: 'an open bay needs a width (or give it a module)' });
    }
  });
export type CabinetBay = z.output<typeof cabinetBaySchema>;

export const cabinetSpecSchema = z
  .strictObject({
    name: nameSchema,
    runId: idSchema.optional(),
    profile: z.string().min(1, 'must name a profile').max(64),
    depth_mm: len('depth'),
    height_mm: len('height'),
    /** Height of the seat: the top of the bottom rails and bearers that base modules stand on. */
    seat_mm: lenOrZero('seat height'),
    clearance_mm: lenOrZero('clearance'),
    bays: z.array(cabinetBaySchema).min(1, 'a cabinet needs at least one bay').max(MAX_BAYS, `at most ${MAX_BAYS} bays`),
    settings: z.custom<FrameDocumentInput['settings']>().optional(),
    units: z.custom<FrameDocumentInput['units']>().optional(),
  })
  .superRefine((s, ctx) => {
    if (s.seat_mm >= s.height_mm) ctx.addIssue({ code: 'custom', path: ['seat_mm'], message: 'the seat must be lower than the top of the frame' });
    const seen = new Map<string, string>();
    const use = (id: string, path: PropertyKey[]) => {
      const before = seen.get(id);
      if (before !== undefined) ctx.addIssue({ code: 'custom', path: [...path, 'id'], message: `"${id}" is already used by ${before}` });
      else seen.set(id, fieldPath(path));
    };
    s.bays.forEach((b, i) => {
      use(b.id, ['bays', i]);
      if (b.module) use(b.module.id, ['bays', i, 'module']);
      b.stack?.forEach((m, k) => use(m.id, ['bays', i, 'stack', k]));
    });
  });
export type CabinetSpec = z.input<typeof cabinetSpecSchema>;

/** Read a cabinet layout (from a form or a file); throws InputError naming the first field at fault. */
export function parseCabinetSpec(json: unknown): z.output<typeof cabinetSpecSchema> {
  const r = cabinetSpecSchema.safeParse(json);
  if (!r.success) {
    const issue = r.error.issues[0];
    const field = fieldPath(issue.path);
    throw new InputError(field, `${field}: ${issue.message}`);
  }
  try {
    resolveProfile(r.data.profile);
  } catch (e) {
    throw new InputError('profile', `profile: ${e instanceof Error ? e.message.replace(/^profile: /, '') : String(e)}`);
  }
  return r.data;
}

const at = (datum: string, align?: 'min' | 'center' | 'max', offset_mm = 0): PositionInput => ({ datum, offset_mm, ...(align ? { align } : {}) });

/** Datum id of a stacked module's base (z): the module below's base plus its height, plus the room between. */
export const moduleBaseDatum = (moduleId: string): string => `${moduleId}-base`;
/** Datum id of a side-rail module's mid-height (z), where its slide rails run. */
export const moduleMidDatum = (moduleId: string): string => `${moduleId}-mid`;
/** Datum ids of a module's sides along the run, for a module narrower than its stack: its bearers follow them. */
export const moduleSideDatums = (moduleId: string): [string, string] => [`${moduleId}-left`, `${moduleId}-right`];
/** Every datum a cabinet layout may make for one module. */
export const moduleDatumIds = (moduleId: string): string[] => [moduleBaseDatum(moduleId), moduleMidDatum(moduleId), ...moduleSideDatums(moduleId)];

/**
 * A cabinet run laid out by reference: an upright pair (front and back) at every bay boundary, rails front and
 * back at the top and at the seat in every bay, cross-members at every upright pair top and bottom; for each
 * module the members that carry it: two bearers under a module that sits (with rails front and back under them
 * when it is raised or stacked), two hangers under the top for one that hangs, a side rail either side (in line
 * with the uprights) for one that runs on slides. Bay members refer to their bay's datums, so they travel with
 * the bay when modules are swapped; uprights and cross-members refer to the run's upright datums, so they move to
 * the new boundaries. A stacked module's base is a datum chained to the one below (its base plus its height), so
 * resizing a module moves everything above it.
 */
export function buildCabinetRun(input: CabinetSpec): FrameDocument {
  const spec = parseCabinetSpec(input);
  const run = spec.runId ?? 'run';
  const p = resolveProfile(spec.profile);
  const t = Math.min(p.width_mm, p.height_mm);
  const datums: DatumInput[] = [
    { type: 'datum', id: 'floor', name: 'Floor', axis: 'z' },
    { type: 'datum', id: 'seat', name: 'Seat (top of the bottom rails)', axis: 'z', from: 'floor', offset_mm: spec.seat_mm },
    { type: 'datum', id: 'top', name: 'Top of the frame', axis: 'z', from: 'floor', offset_mm: spec.height_mm },
    { type: 'datum', id: 'front', name: 'Front face', axis: 'y' },
    { type: 'datum', id: 'back', name: 'Back face', axis: 'y', from: 'front', offset_mm: spec.depth_mm },
  ];
  const members: MemberInput[] = [];
  const modules: ModuleInput[] = [];
  const member = (id: string, axis: 'x' | 'y' | 'z', start: PositionInput, end: PositionInput, place: MemberInput['place'], name: string) =>
    members.push({ type: 'member', id, name, profile: spec.profile, axis, start, end, place });
  const frontY = at('front');
  const backY = at('back', 'max');
  const inFront = at('front', undefined, t);
  const inBack = at('back', undefined, -t);

  for (let k = 0; k <= spec.bays.length; k++) {
    const x = at(`${run}.u${k}`);
    member(`${run}-u${k}-f`, 'z', at('floor'), at('top'), { x, y: frontY }, `Upright ${k + 1}, front`);
    member(`${run}-u${k}-b`, 'z', at('floor'), at('top'), { x, y: backY }, `Upright ${k + 1}, back`);
    member(`${run}-x${k}-top`, 'y', inFront, inBack, { x, z: at('top', 'max') }, `Cross-member ${k + 1}, top`);
    member(`${run}-x${k}-low`, 'y', inFront, inBack, { x, z: at('seat', 'max') }, `Cross-member ${k + 1}, seat`);
  }
  spec.bays.forEach((bay, b) => {
    const label = `Bay ${b + 1}`;
    const s = at(`${bay.id}.start`);
    const e = at(`${bay.id}.end`);
    member(`${bay.id}-top-f`, 'x', s, e, { y: frontY, z: at('top', 'max') }, `${label}: top rail, front`);
    member(`${bay.id}-top-b`, 'x', s, e, { y: backY, z: at('top', 'max') }, `${label}: top rail, back`);
    member(`${bay.id}-low-f`, 'x', s, e, { y: frontY, z: at('seat', 'max') }, `${label}: seat rail, front`);
    member(`${bay.id}-low-b`, 'x', s, e, { y: backY, z: at('seat', 'max') }, `${label}: seat rail, back`);
    const clearance = bay.clearance_mm ?? spec.clearance_mm;
    const held = [...(bay.module ? [bay.module] : []), ...(bay.stack ?? [])];
    const widest = Math.max(0, ...held.map((m) => m.size.w_mm));
    /**
     * Where the members under (or over) a module stand along the run, a quarter profile in from its sides: from
     * the bay's edges for the widest module of the bay, from the module's own sides (datums that follow its width)
     * for a narrower one in a stack or in a bay of a fixed, greater width.
     */
    const fills = bay.width_mm === undefined || bay.width_mm <= widest + 2 * clearance + 1e-6;
    // The opening between the bay's edges, where slide rails stand.
    const inside = fills ? widest + 2 * clearance : (bay.width_mm as number);
    const sidePlaces = (m: CabinetModule): [PositionInput, PositionInput] => {
      // A bay wider than its modules (a fixed width) carries each one from its own sides, as it stands centred.
      if (m.size.w_mm >= widest && fills) {
        const inset = clearance + t / 4;
        return [at(`${bay.id}.start`, 'min', inset), at(`${bay.id}.end`, 'max', -inset)];
      }
      const [l, r] = moduleSideDatums(m.id);
      const name = m.name.trim() || m.id;
      datums.push({ type: 'datum', id: l, name: `Left side of ${name}`, axis: 'x', from: `${bay.id}.mid`, offset_mm: 0, plus: [{ module: m.id, size: 'w', factor: -0.5 }] });
      datums.push({ type: 'datum', id: r, name: `Right side of ${name}`, axis: 'x', from: `${bay.id}.mid`, offset_mm: 0, plus: [{ module: m.id, size: 'w', factor: 0.5 }] });
      return [at(l, 'min', t / 4), at(r, 'max', -t / 4)];
    };
    // Where the next module up starts: a datum plus the height of the module under it (none at the seat).
    let floor: { datum: string; below: string | null } = { datum: 'seat', below: null };
    held.forEach((m, level) => {
      const first = level === 0;
      const name = m.name.trim() || m.id;
      // The demo's bottom modules keep their plain ids; stacked ones carry the module's id.
      const tag = first ? bay.id : `${bay.id}-${m.id}`;
      const of = first ? '' : ` for ${name}`;
      let z: PositionInput;
      if (m.bearing === 'hung') {
        // Hangers under the top, across the depth, set in from the bay's sides like bearers; the module's top is
        // at their underside.
        const [xl, xr] = sidePlaces(m);
        member(`${tag}-hanger-l`, 'y', inFront, inBack, { x: xl, z: at('top', 'max') }, `${label}: hanger for ${name}, left`);
        member(`${tag}-hanger-r`, 'y', inFront, inBack, { x: xr, z: at('top', 'max') }, `${label}: hanger for ${name}, right`);
        z = at('top', 'max', -t);
      } else {
        const room = m.raise_mm ?? (first ? 0 : m.bearing === 'base' ? clearance + t : clearance);
        let base = floor.datum;
        if (!(first && room === 0 && floor.below === null)) {
          base = moduleBaseDatum(m.id);
          datums.push({
            type: 'datum',
            id: base,
            name: `Base of ${name}`,
            axis: 'z',
            from: floor.datum,
            offset_mm: room,
            plus: floor.below ? [{ module: floor.below, size: 'h', factor: 1 }] : [],
          });
        }
        if (m.bearing === 'base') {
          if (base !== 'seat') {
            member(`${tag}-rail-f`, 'x', s, e, { y: frontY, z: at(base, 'max') }, `${label}: rail under ${name}, front`);
            member(`${tag}-rail-b`, 'x', s, e, { y: backY, z: at(base, 'max') }, `${label}: rail under ${name}, back`);
          }
          // Bearers under the module's sides, set in from its edges by a quarter of the profile.
          const [xl, xr] = sidePlaces(m);
          member(`${tag}-bearer-l`, 'y', inFront, inBack, { x: xl, z: at(base, 'max') }, `${label}: bearer${of}, left`);
          member(`${tag}-bearer-r`, 'y', inFront, inBack, { x: xr, z: at(base, 'max') }, `${label}: bearer${of}, right`);
        } else {
          const mid = moduleMidDatum(m.id);
          datums.push({ type: 'datum', id: mid, name: `Slides of ${name}`, axis: 'z', from: base, offset_mm: 0, plus: [{ module: m.id, size: 'h', factor: 0.5 }] });
          member(`${tag}-slide-l`, 'y', inFront, inBack, { x: at(`${bay.id}.start`, 'max'), z: at(mid, 'center') }, `${label}: slide rail${of}, left`);
          member(`${tag}-slide-r`, 'y', inFront, inBack, { x: at(`${bay.id}.end`, 'min'), z: at(mid, 'center') }, `${label}: slide rail${of}, right`);
        }
        z = at(base);
        floor = { datum: base, below: m.id };
      }
      modules.push({
        type: 'module',
        id: m.id,
        name: m.name,
        kind: m.kind,
        size: m.size,
        mass_kg: m.mass_kg,
        contents_kg: m.contents_kg ?? 0,
        ...(m.litres !== undefined ? { litres: m.litres } : {}),
        ...(m.options ? { options: m.options } : {}),
        bearing: m.bearing,
        // Its slides span the gap to the rails at the bay's edges (the clearance, more beside a narrower module
        // in a stack, on packers); a wider gap than slides usually take is still the way this module bears.
        ...(m.bearing === 'side-rails' && (inside - m.size.w_mm) / 2 > DEFAULT_SIDE_GAP_MM
          ? { sideGap_mm: Math.round(((inside - m.size.w_mm) / 2) * 1000) / 1000 + 1 }
          : {}),
        place: { y: inFront, z },
      });
    });
  });
  const doc: FrameDocumentInput = {
    schemaVersion: CURRENT_SCHEMA_VERSION,
    name: spec.name,
    units: spec.units,
    settings: spec.settings,
    datums,
    members,
    modules,
    runs: [
      {
        type: 'run',
        id: run,
        name: spec.name,
        axis: 'x',
        upright_mm: t,
        clearance_mm: spec.clearance_mm,
        bays: spec.bays.map((b) => ({
          id: b.id,
          ...(b.module ? { module: b.module.id } : {}),
          ...(b.stack && b.stack.length > 0 ? { stack: b.stack.map((m) => m.id) } : {}),
          ...(b.width_mm !== undefined ? { width_mm: b.width_mm } : {}),
          ...(b.clearance_mm !== undefined ? { clearance_mm: b.clearance_mm } : {}),
        })),
      },
    ],
  };
  return frameDocumentSchema.parse(doc);
}
