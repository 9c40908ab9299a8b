// `calc drawer --width W --height H --depth D --slide side-mount|under-mount [--thickness T]
//   [--side-deduction LEN --bottom-recess LEN] [--joint butt|dado] [--bottom-thickness T]`:
// a drawer box for an opening (inner faces of the members around it). Lengths take units ("20 in", "450 mm").
import { parseArgs } from 'node:util';
import { InputError } from '../../shared/errors';
import { parseLength } from '../../shared/geometry/units';
import { drawerBox, slidePreset, SLIDE_NOTE } from '../../shared/panels/index';

const USAGE = 'usage: calc drawer --width W --height H --depth D --slide side-mount|under-mount [--thickness T] [--side-deduction LEN --bottom-recess LEN] [--joint butt|dado] [--bottom-thickness T]';
const r2 = (v: number): number => Math.round(v * 100) / 100;

export async function run(args: string[]): Promise<unknown> {
  let values: Record<string, string | undefined>;
  try {
    ({ values } = parseArgs({
      args,
      options: {
        width: { type: 'string' },
        height: { type: 'string' },
        depth: { type: 'string' },
        slide: { type: 'string' },
        thickness: { type: 'string' },
        'side-deduction': { type: 'string' },
        'bottom-recess': { type: 'string' },
        'bottom-thickness': { type: 'string' },
        joint: { type: 'string' },
      },
      strict: true,
    }) as { values: Record<string, string | undefined> });
  } catch (err) {
    throw new InputError('arguments', `${err instanceof Error ? err.message : String(err)}. ${USAGE}`);
  }
  for (const k of ['width', 'height', 'depth', 'slide']) if (values[k] === undefined) throw new InputError(`--${k}`, `--${k}: required. ${USAGE}`);
  if (values.slide !== 'side-mount' && values.slide !== 'under-mount') throw new InputError('--slide', `--slide: side-mount or under-mount (got "${values.slide}")`);
  if (values.joint !== undefined && values.joint !== 'butt' && values.joint !== 'dado') throw new InputError('--joint', `--joint: butt or dado (got "${values.joint}")`);
  const len = (k: string): number | undefined => (values[k] === undefined ? undefined : parseLength(values[k] as string, `--${k}`));
  // Slides are sold in inch lengths where the builder measures in inches.
  const inches = ['width', 'height', 'depth'].some((k) => /in|"|ft|'/.test(values[k] as string));
  const slide = slidePreset(values.slide, inches ? 'inch' : 'metric');
  const sd = len('side-deduction');
  const br = len('bottom-recess');
  if (sd !== undefined) slide.sideDeduction_mm = sd;
  if (br !== undefined) slide.bottomRecess_mm = br;
  const fieldNames: Record<string, string> = {
    'opening.width_mm': '--width',
    'opening.height_mm': '--height',
    'opening.depth_mm': '--depth',
    thickness_mm: '--thickness',
    bottomThickness_mm: '--bottom-thickness',
    'slide.sideDeduction_mm': '--side-deduction',
    'slide.bottomRecess_mm': '--bottom-recess',
  };
  try {
    const box = drawerBox({
      opening: { width_mm: len('width') as number, height_mm: len('height') as number, depth_mm: len('depth') as number },
      slide,
      ...(values.joint ? { joint: values.joint as 'butt' | 'dado' } : {}),
      ...(values.thickness !== undefined ? { thickness_mm: len('thickness') } : {}),
      ...(values['bottom-thickness'] !== undefined ? { bottomThickness_mm: len('bottom-thickness') } : {}),
    });
    return {
      slide_length_mm: r2(box.slide_length_mm),
      box: { width_mm: r2(box.box.width_mm), height_mm: r2(box.box.height_mm), length_mm: r2(box.box.length_mm) },
      bottom: { width_mm: r2(box.bottom.width_mm), length_mm: r2(box.bottom.length_mm), groove_depth_mm: r2(box.bottom.groove_depth_mm) },
      parts: box.parts.map((p) => ({ name: p.name, length_mm: r2(p.length_mm), width_mm: r2(p.width_mm), thickness_mm: r2(p.thickness_mm), qty: p.qty })),
      hardware: box.hardware,
      note: `slide values are ${SLIDE_NOTE}`,
    };
  } catch (err) {
    // Speak of the command line's flags rather than the engine's field names.
    if (err instanceof InputError && fieldNames[err.field]) {
      const flag = fieldNames[err.field];
      throw new InputError(flag, err.message.replace(err.field, flag));
    }
    throw err;
  }
}
