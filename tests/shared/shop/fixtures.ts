import type { CutJob } from '@shared/planner';
import type { ProfilePlan, ShopCutList, ShopMeta } from '@shared/shop/types';

// A small invented galley frame worked by hand: 40×40 uprights A, rails B (end connectors: tapped ends), cross-
// members C (each with two access holes for B's connectors), and two 20×20 shelf battens D. Kerf 3 mm, trim 10 mm.

export const cutList: ShopCutList = {
  kerf_mm: 3,
  toleranceClass: 'ISO 2768-1 m (medium)',
  parts: [
    { mark: 'A', profileId: '40x40-s8', profileName: '40×40 slot 8', cutLength_mm: 850, qty: 4, tolerance_mm: 0.8, ops: [], members: ['upright'] },
    {
      mark: 'B',
      profileId: '40x40-s8',
      profileName: '40×40 slot 8',
      cutLength_mm: 1120,
      qty: 4,
      tolerance_mm: 1.2,
      ops: [
        { kind: 'end-tap', end: 'start', thread: 'M8', tapDrill_mm: 6.8, depth_mm: 18 },
        { kind: 'end-tap', end: 'end', thread: 'M8', tapDrill_mm: 6.8, depth_mm: 18 },
      ],
      members: ['rail'],
    },
    {
      mark: 'C',
      profileId: '40x40-s8',
      profileName: '40×40 slot 8',
      cutLength_mm: 520,
      qty: 4,
      tolerance_mm: 0.8,
      ops: [{ kind: 'access-hole', at_mm: 20, face: 'front', diameter_mm: 8 }],
      members: ['cross-member'],
    },
    { mark: 'D', profileId: '20x20-s6', profileName: '20×20 slot 6', cutLength_mm: 480, qty: 2, tolerance_mm: 0.5, ops: [], members: ['shelf batten'] },
  ],
  hardware: [
    { key: 'bracket|40', kind: 'bracket', name: 'corner bracket for 40 mm profile', qty: 16, spares: 2, toBuy: 18 },
    { key: 'screw|M8x16', kind: 'screw', name: 'M8 × 16 cap screw', qty: 32, spares: 4, toBuy: 36 },
    { key: 'tnut|M8', kind: 't-nut', name: 'T-nut M8 slide-in', qty: 32, spares: 4, toBuy: 36 },
    { key: 'conn|M8', kind: 'connector', name: 'end connector M8', qty: 8, spares: 1, toBuy: 9 },
    { key: 'cap|20', kind: 'end-cap', name: 'end cap 20×20', qty: 4, spares: 0, toBuy: 4 },
  ],
  nutWarnings: [{ mark: 'B', message: 'Slide 2 T-nuts into the top slot of rail B before fitting the second upright' }],
};

/** Bars worked by hand: trim 10 + parts + one kerf between parts ≤ bar; the leftover takes one more kerf when kept. */
export const plans: ProfilePlan[] = [
  {
    profileId: '40x40-s8',
    profileName: '40×40 slot 8',
    kerf_mm: 3,
    trim_mm: 10,
    bars: [
      // 10 + 4×1120 + 850 + 520 + 5×3 = 5875; 6000 − 5875 = 125 → waste
      {
        stock_mm: 6000,
        fromShelf: false,
        price: 42,
        cuts: [
          { length_mm: 1120, mark: 'B' },
          { length_mm: 1120, mark: 'B' },
          { length_mm: 1120, mark: 'B' },
          { length_mm: 1120, mark: 'B' },
          { length_mm: 850, mark: 'A' },
          { length_mm: 520, mark: 'C' },
        ],
        leftover_mm: 125,
        leftoverKept: false,
      },
      // 10 + 3×850 + 3×520 + 5×3 = 4135; 6000 − 4135 − 3 = 1862 → kept
      {
        stock_mm: 6000,
        fromShelf: false,
        price: 42,
        cuts: [
          { length_mm: 850, mark: 'A' },
          { length_mm: 850, mark: 'A' },
          { length_mm: 850, mark: 'A' },
          { length_mm: 520, mark: 'C' },
          { length_mm: 520, mark: 'C' },
          { length_mm: 520, mark: 'C' },
        ],
        leftover_mm: 1862,
        leftoverKept: true,
      },
    ],
    cost: 84,
    waste_pct: 1.0,
    lowerBound: 2,
    optimal: true,
  },
  {
    profileId: '20x20-s6',
    profileName: '20×20 slot 6',
    kerf_mm: 3,
    trim_mm: 10,
    // 10 + 2×480 + 3 = 973; 1200 − 973 − 3 = 224 → kept
    bars: [{ stock_mm: 1200, fromShelf: true, price: 0, cuts: [{ length_mm: 480, mark: 'D' }, { length_mm: 480, mark: 'D' }], leftover_mm: 224, leftoverKept: true }],
    cost: 0,
    waste_pct: 0,
    lowerBound: 1,
    optimal: true,
  },
];

export const meta: ShopMeta = {
  project: 'Rear kitchen pod — short-wheelbase van',
  frame: 'Kitchen pod v1',
  revision: 7,
  date: '2026-12-01',
  workshop: 'Harbour Lane Van Works',
  units: { display: 'mm', frac: 16 },
  paper: 'A4',
};

/** The same parts as planner jobs: 6000 mm bars at 42.00 for 40×40; one 1200 mm offcut on the shelf for 20×20. */
export const jobs: { profileId: string; profileName: string; job: CutJob }[] = [
  {
    profileId: '40x40-s8',
    profileName: '40×40 slot 8',
    job: {
      kerf: 3,
      trim: 10,
      minOffcut: 200,
      stock: [{ length: 6000, price: 42 }],
      parts: [
        { length: 1120, qty: 4, label: 'B' },
        { length: 850, qty: 4, label: 'A' },
        { length: 520, qty: 4, label: 'C' },
      ],
    },
  },
  {
    profileId: '20x20-s6',
    profileName: '20×20 slot 6',
    job: { kerf: 3, trim: 10, minOffcut: 200, stock: [{ length: 1200, qty: 1, price: 0 }], parts: [{ length: 480, qty: 2, label: 'D' }] },
  },
];
