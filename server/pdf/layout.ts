import type { Content, ContentCanvas, TDocumentDefinitions } from 'pdfmake/interfaces';
import { dateText } from '@shared/display/format';
import type { ShopMeta } from '@shared/shop/types';

// The look every shop document shares: Barlow, black on white (they are photocopied and taped near the saw),
// a header naming the document and the job on every page, page numbers in the footer.

export const INK = '#111111';
export const MUTED = '#555555';
export const RULE = '#BBBBBB';
export const FILL = '#E8E8E8';
export const MARGIN = 36;

/** Usable width in points for the page size. */
export const contentWidth = (paper: ShopMeta['paper']): number => (paper === 'A4' ? 595.28 : 612) - 2 * MARGIN;

export const checkbox = (size = 11): ContentCanvas => ({
  canvas: [{ type: 'rect', x: 0, y: 1, w: size, h: size, lineWidth: 1, lineColor: INK }],
});

export function metaLine(meta: ShopMeta): string {
  return `${meta.project} · ${meta.frame} · revision ${meta.revision} · ${dateText(meta.date, meta.units)}`;
}

/** A label/value row for the header block ("Kerf  3 mm"). */
export function facts(items: [string, string][]): Content {
  return {
    table: {
      widths: items.map(() => '*'),
      body: [
        items.map(([k]) => ({ text: k.toUpperCase(), fontSize: 7, color: MUTED, characterSpacing: 0.5 })),
        items.map(([, v]) => ({ text: v, fontSize: 11, bold: true })),
      ],
    },
    layout: {
      hLineWidth: (i: number) => (i === 0 || i === 2 ? 0.75 : 0),
      vLineWidth: () => 0,
      hLineColor: () => RULE,
      paddingTop: (i: number) => (i === 0 ? 4 : 0),
      paddingBottom: (i: number) => (i === 1 ? 5 : 1),
    },
    margin: [0, 0, 0, 10],
  };
}

/** Thin grey rules between rows only: easy to read across, prints cleanly. */
export const rowsLayout = {
  hLineWidth: (i: number, node: { table: { body: unknown[] } }) => (i === 0 || i === node.table.body.length ? 0 : i === 1 ? 1 : 0.5),
  vLineWidth: () => 0,
  hLineColor: (i: number) => (i === 1 ? INK : RULE),
  paddingTop: () => 4,
  paddingBottom: () => 4,
  paddingLeft: (i: number) => (i === 0 ? 0 : 5),
  paddingRight: () => 5,
};

export function shopDocument(title: string, meta: ShopMeta, content: Content[], opts: { caution?: string } = {}): TDocumentDefinitions {
  const width = contentWidth(meta.paper);
  return {
    pageSize: meta.paper,
    pageMargins: [MARGIN, 58, MARGIN, 44],
    info: { title: `${title} — ${meta.project}, ${meta.frame}`, creator: 'Slotwright', producer: 'Slotwright' },
    defaultStyle: { font: 'Barlow', fontSize: 10, color: INK, lineHeight: 1.1 },
    styles: {
      h2: { font: 'BarlowBold', fontSize: 14, margin: [0, 6, 0, 4] },
      h3: { font: 'BarlowBold', fontSize: 11.5, margin: [0, 4, 0, 3] },
      th: { fontSize: 8, color: MUTED, bold: true },
      muted: { color: MUTED, fontSize: 8.5 },
      caution: { fontSize: 8.5, italics: true, color: MUTED },
    },
    header: () => ({
      margin: [MARGIN, 22, MARGIN, 0],
      stack: [
        {
          columns: [
            { text: title, font: 'BarlowBold', fontSize: 16, width: 'auto' },
            { text: metaLine(meta), alignment: 'right', fontSize: 9, color: MUTED, margin: [0, 5, 0, 0] },
          ],
        },
        { canvas: [{ type: 'line', x1: 0, y1: 4, x2: width, y2: 4, lineWidth: 1.25, lineColor: INK }] },
      ],
    }),
    footer: (page: number, pages: number) => ({
      margin: [MARGIN, 14, MARGIN, 0],
      columns: [
        { text: opts.caution ?? meta.workshop, fontSize: 7.5, color: MUTED, width: '*' },
        { text: `Page ${page} of ${pages}`, alignment: 'right', fontSize: 9, bold: true, width: 80 },
      ],
    }),
    content,
  };
}
