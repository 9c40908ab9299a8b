import { lengthText } from '../display/format';
import type { ShopOp, ShopUnits } from './types';

export { dateText, lengthText, massText } from '../display/format';

/** Whole millimetres for drilling positions when the builder works in mm; a tape reading otherwise. */
export const positionText = (mm: number, units: ShopUnits): string => lengthText(mm, units);

const num = (v: number): string => `${Math.round(v * 100) / 100}`;

/** One machining step in shop words, e.g. "Tap M8 at the start end — drill Ø6.8, 18 mm deep". */
export function opText(op: ShopOp, units: ShopUnits): string {
  switch (op.kind) {
    case 'end-tap':
      return `Tap ${op.thread} in the ${op.end} end — drill Ø${num(op.tapDrill_mm)} mm, ${num(op.depth_mm)} mm deep`;
    case 'access-hole':
      return `Access hole Ø${num(op.diameter_mm)} mm in the ${op.face} face, ${positionText(op.at_mm, units)} from the start`;
  }
}

/** Short form for labels and the saw list: "tap start", "hole @ 20 mm". */
export function opShort(op: ShopOp, units: ShopUnits): string {
  switch (op.kind) {
    case 'end-tap':
      return `tap ${op.end} ${op.thread}`;
    case 'access-hole':
      return `hole Ø${num(op.diameter_mm)} @ ${positionText(op.at_mm, units)}`;
  }
}

/** "€30.00" in the supplier's currency; plain figures with the code when the currency is unknown to Intl. */
export function moneyText(value: number, currency: string): string {
  try {
    return new Intl.NumberFormat('en-GB', { style: 'currency', currency }).format(value);
  } catch {
    return `${currency} ${value.toFixed(2)}`;
  }
}

/** "2 × 6000 mm" style stock text. */
export const stockText = (mm: number, units: ShopUnits): string => `${lengthText(mm, units)} bar`;
