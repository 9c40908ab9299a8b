import type { CanvasElement, Content, TableCell } from 'pdfmake/interfaces';
import type { SawBar, SawProfile, SawSheet } from '@shared/shop/saw-list';
import { checkbox, contentWidth, facts, FILL, INK, MUTED, RULE, rowsLayout, shopDocument } from './layout';
import { renderPdf } from './render';

const SAW_CAUTION = 'Wear eye and hearing protection, clamp the work and follow the saw maker’s instructions. Deburr every cut.';
const BAR_H = 20;

/** The bar drawn to scale (the profile's longest stock = full width): trim hatched, parts grey, kerfs black, offcut open. */
function diagram(bar: SawBar, scale_mm: number, width: number): Content {
  const k = width / scale_mm;
  const shapes: CanvasElement[] = [];
  const labels: Content[] = [];
  for (const s of bar.segments) {
    const x = s.from_mm * k;
    const w = Math.max((s.to_mm - s.from_mm) * k, 0.6);
    switch (s.kind) {
      case 'cut':
        shapes.push({ type: 'rect', x, y: 0, w, h: BAR_H, color: FILL, lineColor: INK, lineWidth: 0.75 });
        if (w > 14) labels.push({ text: s.mark ?? '', bold: true, fontSize: w > 40 ? 10 : 8, absolutePosition: undefined, relativePosition: { x: x, y: -BAR_H + (w > 40 ? 4 : 5) }, width: w, alignment: 'center' } as Content);
        break;
      case 'kerf':
        shapes.push({ type: 'rect', x, y: 0, w, h: BAR_H, color: INK });
        break;
      case 'trim':
        shapes.push({ type: 'rect', x, y: 0, w, h: BAR_H, color: '#777777' });
        break;
      case 'leftover':
        shapes.push({ type: 'rect', x, y: 0, w, h: BAR_H, lineColor: INK, lineWidth: 0.75, dash: { length: 3 } });
        break;
      case 'waste':
        shapes.push({ type: 'rect', x, y: 0, w, h: BAR_H, color: '#FFFFFF', lineColor: RULE, lineWidth: 0.75 });
        for (let hx = x + 4; hx < x + w; hx += 6) shapes.push({ type: 'line', x1: hx, y1: BAR_H, x2: Math.min(hx + 6, x + w), y2: 0, lineWidth: 0.4, lineColor: MUTED });
        break;
    }
  }
  // The stock length as an outline, so a shelf offcut's true end shows even when a segment is tiny.
  shapes.push({ type: 'rect', x: 0, y: 0, w: bar.stock_mm * k, h: BAR_H, lineColor: INK, lineWidth: 1.1 });
  return { stack: [{ canvas: shapes }, ...labels.map((l) => ({ columns: [l] }) as Content)], margin: [0, 2, 0, 6] };
}

function barBlock(p: SawProfile, bar: SawBar, width: number): Content {
  const source = bar.fromShelf ? 'offcut from the shelf' : 'stock bar';
  const span = (cell: TableCell): TableCell[] => [{ ...(cell as object), colSpan: 6 } as TableCell, '', '', '', '', ''];
  const body: TableCell[][] = [
    span({
      columns: [
        { text: [{ text: `Bar ${bar.n} of ${p.bars.length}`, font: 'BarlowBold', fontSize: 12 }, { text: `   ${bar.stockText} ${source}`, fontSize: 10 }], width: '*' },
        { text: `${bar.cuts.length} cut${bar.cuts.length === 1 ? '' : 's'} · full width = ${p.scaleText}`, alignment: 'right', color: MUTED, fontSize: 8.5, width: 160, margin: [0, 3, 0, 0] },
      ],
      margin: [0, 8, 0, 0],
    }),
    span(diagram(bar, p.scale_mm, width) as TableCell),
    ['', '#', 'Mark', 'Length', 'Piece', 'Machining'].map((t) => ({ text: t, style: 'th' })),
  ];
  for (const c of bar.cuts) {
    body.push([
      checkbox(12),
      { text: String(c.seq), color: MUTED, margin: [0, 2, 0, 0] },
      { text: c.mark, font: 'BarlowBold', fontSize: 12.5 },
      { text: c.lengthText, font: 'BarlowBold', fontSize: 12.5 },
      { text: `${c.piece} of ${c.of}`, color: MUTED, margin: [0, 2, 0, 0] },
      { text: c.ops.join(', ') || '—', fontSize: 9, margin: [0, 2, 0, 0] },
    ]);
  }
  body.push([
    '',
    '',
    { text: bar.leftoverKept ? 'Offcut' : 'Waste', italics: true, color: MUTED },
    { text: bar.leftoverText, color: MUTED },
    { text: bar.leftoverKept ? 'keep: mark it and shelve it' : 'scrap', colSpan: 2, color: MUTED, fontSize: 9 },
    '',
  ]);
  const last = body.length;
  return {
    table: { headerRows: 3, keepWithHeaderRows: 2, dontBreakRows: true, widths: [14, 14, 44, 90, 44, '*'], body },
    layout: {
      hLineWidth: (i: number) => (i === 3 ? 1 : i > 3 && i < last ? 0.5 : 0),
      vLineWidth: () => 0,
      hLineColor: (i: number) => (i === 3 ? INK : RULE),
      paddingTop: (i: number) => (i < 2 ? 0 : 2.5),
      paddingBottom: (i: number) => (i < 2 ? 0 : 2.5),
      paddingLeft: (i: number) => (i === 0 ? 0 : 5),
      paddingRight: () => 5,
    },
  };
}

/** The printed saw cut list. */
export async function sawListPdf(sheet: SawSheet): Promise<Buffer> {
  const width = contentWidth(sheet.meta.paper);
  const content: Content[] = [
    facts([
      ['Kerf', sheet.kerfText],
      ['Trim cut', sheet.profiles[0]?.trimText ?? '—'],
      ['Tolerance', sheet.toleranceClass],
      ['Units', sheet.meta.units.display === 'mm' ? 'millimetres' : `inches to 1/${sheet.meta.units.frac}`],
      ['Bars', String(sheet.barCount)],
      ['Cuts', String(sheet.cutCount)],
    ]),
    { text: `Cut in the order listed: longest parts first, so a miscut can become a shorter part. Trim the factory end first. ${SAW_CAUTION}`, style: 'caution', margin: [0, 0, 0, 4] },
  ];
  sheet.profiles.forEach((p, i) => {
    content.push({
      text: [{ text: p.profileName }, { text: `   ${p.bars.length} bar${p.bars.length === 1 ? '' : 's'} · ${p.cutCount} cuts · kerf ${p.kerfText} · trim ${p.trimText}`, font: 'Barlow', fontSize: 10, color: MUTED }],
      style: 'h2',
      pageBreak: i > 0 ? 'before' : undefined,
    });
    for (const bar of p.bars) content.push(barBlock(p, bar, width));
  });
  return renderPdf(shopDocument('Saw cut list', sheet.meta, content, { caution: 'Tick each cut as it comes off the saw.' }));
}
