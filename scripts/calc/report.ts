import { readFile } from 'node:fs/promises';
import { diffReports, type WhatChanged } from '@shared/engine/diff';
import { computeReport, type FrameReport } from '@shared/engine/report';
import { parseFrameDocument } from '@shared/model/parse';

const USAGE = 'usage: calc report FRAME.json [--against OLD_FRAME.json]';

async function readFrame(path: string, field: string) {
  let text: string;
  try {
    text = await readFile(path, 'utf8');
  } catch (e) {
    throw new Error(`${field}: cannot read "${path}" (${(e as NodeJS.ErrnoException).code ?? 'error'})`);
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    throw new Error(`${field}: "${path}" is not valid JSON (${(e as Error).message})`);
  }
  try {
    return parseFrameDocument(json);
  } catch (e) {
    throw new Error(`${path}: ${(e as Error).message}`);
  }
}

/**
 * `calc report FRAME.json`: the whole report on a frame document as JSON (see shared/engine/report-types.ts).
 * With `--against OLD.json`, part marks carry over from the old frame and `what_changed` lists what to reuse.
 */
export async function run(args: string[]): Promise<FrameReport | (FrameReport & { what_changed: WhatChanged })> {
  const rest = [...args];
  let against: string | undefined;
  const k = rest.indexOf('--against');
  if (k >= 0) {
    against = rest[k + 1];
    if (!against || against.startsWith('--')) throw new Error(`--against: give the old frame's file. ${USAGE}`);
    rest.splice(k, 2);
  }
  const unknown = rest.find((a) => a.startsWith('--'));
  if (unknown) throw new Error(`${unknown}: unknown option. ${USAGE}`);
  if (rest.length !== 1) throw new Error(`FRAME.json: give exactly one frame file. ${USAGE}`);
  const doc = await readFrame(rest[0], 'FRAME.json');
  if (!against) return computeReport(doc);
  const old = computeReport(await readFrame(against, '--against'));
  const report = computeReport(doc, { previous: old });
  return { ...report, what_changed: diffReports(old, report) };
}
