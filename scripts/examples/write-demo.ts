// Writes the demo frame (shared/model/demo-frame.ts) as scripts/examples/rear-kitchen-pod.json, so the example
// file and the frame the editor and the seed start from stay the same document. Run: npx tsx scripts/examples/write-demo.ts
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { demoFrameDocument } from '@shared/model/demo-frame';

const out = fileURLToPath(new URL('./rear-kitchen-pod.json', import.meta.url));
writeFileSync(out, JSON.stringify(demoFrameDocument(), null, 2) + '\n');
process.stdout.write(`wrote ${out}\n`);
