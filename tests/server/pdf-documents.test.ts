import { describe, expect, it } from 'vitest';
import { drillSheet } from '@shared/shop/drill-list';
import { partLabels } from '@shared/shop/labels';
import { orderList } from '@shared/shop/order-list';
import { pickSheet } from '@shared/shop/pick-list';
import { sawSheet } from '@shared/shop/saw-list';
import { drillListPdf, labelsPdf, orderListPdf, pickListPdf, sawListPdf } from '../../server/pdf';
import { planCutsSync } from '@shared/planner';
import { cutList, jobs, meta, plans } from '../shared/shop/fixtures';
import { pdfText } from '../support/pdf-text';

const count = (text: string, re: RegExp): number => text.match(new RegExp(re.source, 'g'))?.length ?? 0;

describe('printed saw cut list', () => {
  it('lists every planned cut with its mark and length, bar by bar, with the header facts', async () => {
    const buf = await sawListPdf(sawSheet(cutList, plans, meta));
    expect(buf.subarray(0, 5).toString()).toBe('%PDF-');
    const { text, pages } = await pdfText(buf);
    // 14 cuts: 4 × 1120, 4 × 850, 4 × 520, 2 × 480, each on its own row
    expect(count(text, /\b1120 mm\b/)).toBe(4);
    expect(count(text, /\b850 mm\b/)).toBe(4);
    expect(count(text, /\b520 mm\b/)).toBe(4);
    expect(count(text, /\b480 mm\b/)).toBe(2);
    // the bar count matches the plan: 2 bars of 40×40 and 1 of 20×20
    expect(count(text, /Bar \d of 2\b/)).toBe(2);
    expect(count(text, /Bar 1 of 1\b/)).toBe(1);
    expect(text).toContain('ISO 2768-1 m');
    expect(text).toContain('Kitchen pod v1');
    expect(text).toContain('revision 7');
    expect(text).toMatch(/Page 1 of 2/);
    expect(pages).toHaveLength(2);
    expect(text).toContain('tap start M8');
  });

  it('prints inches to the chosen fraction on US Letter', async () => {
    const buf = await sawListPdf(sawSheet(cutList, plans, { ...meta, paper: 'LETTER', units: { display: 'in', frac: 32 } }));
    const { text } = await pdfText(buf);
    // 1120 mm / 25.4 = 44.094 in; nearest 1/32 is 44 3/32 (25.4 mm per inch exactly, NIST)
    expect(count(text, /44 3\/32"/)).toBe(4);
    // 520 mm / 25.4 = 20.472 in → 20 15/32
    expect(count(text, /20 15\/32"/)).toBeGreaterThanOrEqual(4);
    expect(buf.toString('latin1')).toMatch(/\/MediaBox \[0 0 612 792\]/);
  });

  it('embeds the Barlow font', async () => {
    const buf = await sawListPdf(sawSheet(cutList, plans, meta));
    expect(buf.toString('latin1')).toMatch(/\/BaseFont \/[A-Z]{6}\+Barlow/);
  });
});

describe('other shop documents', () => {
  it('drill and tap list has every machined mark with its steps', async () => {
    const { text } = await pdfText(await drillListPdf(drillSheet(cutList, meta.units), meta));
    expect(text).toContain('Tap M8 in the start end');
    expect(text).toMatch(/Access hole Ø8 mm in the front face, 20 mm from the\s+start/);
    expect(text).not.toMatch(/\bD\b.*480 mm/);
  });

  it('drill list and labels in inches for an inch shop, the date day first', async () => {
    const inch = { ...meta, units: { display: 'in', frac: 16, date: 'dmy' } as const };
    const { text } = await pdfText(await drillListPdf(drillSheet(cutList, inch.units), inch));
    // 20 mm / 25.4 = 0.787 in → nearest 1/16 is 13/16 (0.8125); 1 in = 25.4 mm exactly (NIST SP 811)
    expect(text).toMatch(/Access hole Ø8 mm in the front face, 13\/16" from the\s+start/);
    expect(text).toContain('01/12/2026');
    const labels = await pdfText(await labelsPdf(partLabels(cutList, inch), inch));
    // 1120 mm = 44.094 in → 44 1/16 is 44.0625, 44 1/8 is 44.125: nearest is 44 1/8
    expect(count(labels.text, /44 1\/8"/)).toBe(4);
    expect(labels.text).not.toMatch(/\b1120 mm\b/);
  });

  it('pick list shows counts and the slide-in warning', async () => {
    const { text } = await pdfText(await pickListPdf(pickSheet(cutList), meta));
    expect(text).toContain('T-NUTS TO SLIDE IN BEFORE CLOSING A SLOT');
    expect(text).toContain('Slide 2 T-nuts into the top slot of rail B');
    expect(text).toContain('T-nut M8 slide-in');
    expect(text).toMatch(/\b36\b/);
  });

  it('labels sheet has one label per piece', async () => {
    const { text } = await pdfText(await labelsPdf(partLabels(cutList, meta), meta));
    expect(count(text, /\b\d\/4\b/)).toBe(12);
    expect(count(text, /\b\d\/2\b/)).toBe(2);
  });

  it('order list shows the bars with cost and the cut-to-length alternative', async () => {
    const planned = jobs.map((j) => ({ ...j, plan: planCutsSync(j.job, { timeLimitMs: 200 }) }));
    const order = orderList(planned, 'EUR', { cutFee: 1.5, pricePerMetre: { '40x40-s8': 9.5, '20x20-s6': 4 } });
    const { text } = await pdfText(await orderListPdf(order, meta, { supplier: 'Northgate Metals', reference: null, mode: 'stock' }));
    expect(text).toContain('Northgate Metals');
    expect(text).toContain('€84.00');
    expect(text).toContain('€119.46');
    expect(text).toContain('14 cuts');
    expect(text).toContain('offcut on hand');
  });
});
