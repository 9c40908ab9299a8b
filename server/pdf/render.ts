import { createRequire } from 'node:module';
import { dirname, join, resolve } from 'node:path';
import pdfmake from 'pdfmake';
import type { TDocumentDefinitions, TFontDictionary } from 'pdfmake/interfaces';

// pdfmake keeps its fonts and access policies on one shared instance; every document here uses the same Barlow
// files, so setting them again on each call is harmless and keeps this module free of start-up state.

const require = createRequire(import.meta.url);
const FONT_DIR = resolve(join(dirname(require.resolve('@fontsource/barlow/package.json')), 'files'));

const face = (weight: number, style: 'normal' | 'italic'): string => join(FONT_DIR, `barlow-latin-${weight}-${style}.woff`);

export const FONTS: TFontDictionary = {
  Barlow: { normal: face(400, 'normal'), bold: face(600, 'normal'), italics: face(400, 'italic'), bolditalics: face(600, 'italic') },
  BarlowBold: { normal: face(700, 'normal'), bold: face(800, 'normal'), italics: face(700, 'italic'), bolditalics: face(800, 'italic') },
};

function configure(): void {
  pdfmake.setFonts(FONTS);
  // Documents are built from our own data only: no fetching, and no file reads outside the font folder.
  pdfmake.setUrlAccessPolicy(() => false);
  pdfmake.setLocalAccessPolicy((path: string) => resolve(path).startsWith(FONT_DIR));
}

/** Lays out and renders a document definition to PDF bytes. */
export async function renderPdf(doc: TDocumentDefinitions): Promise<Buffer> {
  configure();
  return pdfmake.createPdf(doc).getBuffer();
}
