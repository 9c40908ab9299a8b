import { PDFParse } from 'pdf-parse';

/** The text of a PDF, whole and page by page, for checking what a printed document says. */
export async function pdfText(buf: Buffer): Promise<{ text: string; pages: string[] }> {
  const parser = new PDFParse({ data: new Uint8Array(buf) });
  try {
    const r = await parser.getText();
    return { text: r.text, pages: r.pages.map((p) => p.text) };
  } finally {
    await parser.destroy();
  }
}
