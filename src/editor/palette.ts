import type { ModuleKind } from '@shared/model/module';

/** Colours of the drawing, matched to the app theme (plugins/vuetify.ts): bar stock greys, copper for what is active. */
export const PALETTE = {
  paper: '#F4F6F8',
  /** Sheet goods (drawer boxes, panels, countertop): wood tones, mostly transparent so members read through. */
  goodsDrawer: 'rgba(176, 124, 60, 0.16)',
  goodsPanel: 'rgba(176, 124, 60, 0.10)',
  goodsEdge: 'rgba(140, 92, 36, 0.55)',
  gridMinor: 'rgba(43, 48, 54, 0.06)',
  gridMajor: 'rgba(43, 48, 54, 0.14)',
  axis: 'rgba(43, 48, 54, 0.35)',
  member: '#B9C0C7',
  memberFar: '#D3D8DD',
  memberEdge: '#4A535C',
  slot: 'rgba(30, 35, 40, 0.55)',
  selection: '#B4581F',
  selectionFill: 'rgba(180, 88, 31, 0.16)',
  handle: '#FFFFFF',
  snap: '#0F7B8A',
  dimension: '#353C43',
  ghost: 'rgba(180, 88, 31, 0.35)',
  label: '#1E2328',
  labelBack: 'rgba(250, 251, 252, 0.92)',
  cog: '#1E2328',
  ruler: '#E2E6EA',
  rulerText: '#4A535C',
  swapTarget: 'rgba(15, 123, 138, 0.22)',
} as const;

export const MODULE_FILL: Readonly<Record<ModuleKind, string>> = {
  appliance: 'rgba(62, 106, 134, 0.16)',
  sink: 'rgba(46, 116, 80, 0.14)',
  'drawer-stack': 'rgba(154, 91, 0, 0.13)',
  tank: 'rgba(48, 96, 170, 0.16)',
  shelf: 'rgba(107, 116, 128, 0.14)',
  other: 'rgba(107, 116, 128, 0.12)',
};
export const MODULE_EDGE: Readonly<Record<ModuleKind, string>> = {
  appliance: '#3E6A86',
  sink: '#2E7450',
  'drawer-stack': '#9A5B00',
  tank: '#3060AA',
  shelf: '#6B7480',
  other: '#6B7480',
};

/** Utilisation bands, each with a word as well as a colour (colour is never the only signal). */
export type UtilisationBand = { max: number; label: string; fill: string; text: string };
export const UTILISATION_BANDS: readonly UtilisationBand[] = [
  { max: 0.5, label: 'Up to 50 %', fill: '#8CC5B0', text: 'light' },
  { max: 0.8, label: '50–80 %', fill: '#E8CF6A', text: 'moderate' },
  { max: 1, label: '80–100 %', fill: '#EE9A4D', text: 'near limit' },
  { max: Infinity, label: 'Over 100 %', fill: '#D9534A', text: 'over limit' },
];

export function utilisationBand(u: number): UtilisationBand {
  return UTILISATION_BANDS.find((b) => u <= b.max) ?? UTILISATION_BANDS[UTILISATION_BANDS.length - 1];
}

export const percent = (u: number): string => `${Math.round(u * 100)} %`;
