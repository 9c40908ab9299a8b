import { withOption } from '../engine/options';
import type { FrameDocument } from '../model/frame-document';
import { MAX_OPTIONS, moduleLabel, moduleOptionSchema, type Module, type ModuleOption } from '../model/module';
import { capital, refuse, type EditOutcome } from './outcome';

const sameSize = (a: Module['size'], b: Module['size']) => a.w_mm === b.w_mm && a.d_mm === b.d_mm && a.h_mm === b.h_mm;

/** The module's present values as an option, so that choosing another one can be gone back on from the table. */
function asOption(m: Module): ModuleOption {
  return { name: m.name?.trim() || 'As drawn', mass_kg: m.mass_kg, contents_kg: m.contents_kg, ...(m.litres !== undefined ? { litres: m.litres } : {}), size: m.size };
}

const matches = (m: Module, o: ModuleOption) =>
  o.mass_kg === m.mass_kg && (o.contents_kg ?? m.contents_kg) === m.contents_kg && (o.litres ?? m.litres) === m.litres && sameSize(o.size ?? m.size, m.size);

/**
 * "Use this one": the module takes the option's mass, contents and size, as one edit (one undo step). Its present
 * values are kept among the options when no option has them yet, so the table can switch back.
 */
export function applyModuleOption(doc: FrameDocument, moduleId: string, index: number): EditOutcome {
  const mod = doc.modules.find((m) => m.id === moduleId);
  if (!mod) return refuse('That module is no longer in the frame.');
  const o = mod.options?.[index];
  if (!o) return refuse(`${capital(moduleLabel(mod))} has no such option.`);
  const options = (mod.options ?? []).slice();
  if (!options.some((x) => matches(mod, x))) {
    if (options.length >= MAX_OPTIONS) return refuse(`${capital(moduleLabel(mod))} already has ${MAX_OPTIONS} options; remove one so the present one can be kept.`);
    options.push(asOption(mod));
  }
  const next = { ...withOption(mod, o), options };
  return { ok: true, doc: { ...doc, modules: doc.modules.map((m) => (m.id === moduleId ? next : m)) }, label: `Use ${o.name} for ${moduleLabel(mod)}` };
}

/** Replace a module's list of options (from the options table's form); each is checked, naming the field. */
export function setModuleOptions(doc: FrameDocument, moduleId: string, options: unknown[]): EditOutcome {
  const mod = doc.modules.find((m) => m.id === moduleId);
  if (!mod) return refuse('That module is no longer in the frame.');
  if (options.length > MAX_OPTIONS) return refuse(`A module carries at most ${MAX_OPTIONS} options.`);
  const parsed: ModuleOption[] = [];
  for (const [i, o] of options.entries()) {
    const r = moduleOptionSchema.safeParse(o);
    if (!r.success) {
      const issue = r.error.issues[0];
      const field = { name: 'name', mass_kg: 'mass', contents_kg: 'contents', litres: 'litres', size: 'size' }[String(issue.path[0]) as 'name'] ?? 'value';
      return refuse(`Option ${i + 1}: its ${field} ${issue.message}.`);
    }
    parsed.push(r.data);
  }
  const next: Module = { ...mod, options: parsed };
  if (parsed.length === 0) delete next.options;
  return { ok: true, doc: { ...doc, modules: doc.modules.map((m) => (m.id === moduleId ? next : m)) }, label: `Options for ${moduleLabel(mod)}` };
}
