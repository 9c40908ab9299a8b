import { z } from 'zod';
import type { WhatChanged } from '../engine/diff';
import type { CsvRowError } from '../shop/csv-import';
import type { OrderList, ProfilePlan, ShopCutList, ShopMeta, ShopUnits } from '../shop/types';
import { idSchema, nameSchema, text, userRefSchema } from './common';

// Shop outputs and ordering: suppliers, orders, the saw's cutting state, shelf stock, imports and attachments.

export const currencySchema = z
  .string()
  .trim()
  .toUpperCase()
  .regex(/^[A-Z]{3}$/, { message: 'A three-letter currency code such as EUR, GBP or USD' });

export const supplierStockLineSchema = z.object({
  /** A profile id, or null for a bar length and price they sell in any profile. */
  profile: text(z.string().trim().min(1).max(64)).nullable(),
  length_mm: z.number({ message: 'A length in mm' }).positive({ message: 'Must be more than 0' }).max(20000, { message: 'At most 20000 mm' }),
  price: z.number({ message: 'A price' }).min(0, { message: 'Must not be negative' }).max(100000, { message: 'At most 100000' }),
});
export type SupplierStockLine = z.infer<typeof supplierStockLineSchema>;

export const supplierInputSchema = z.object({
  name: nameSchema,
  email: z.string({ message: 'Required' }).trim().toLowerCase().max(254).pipe(z.email({ message: 'Not a valid e-mail address' })),
  currency: currencySchema.default('EUR'),
  stock: z.array(supplierStockLineSchema).max(50, { message: 'At most 50 stock lines' }).default([]),
  cutFee: z.number({ message: 'A fee per cut' }).min(0, { message: 'Must not be negative' }).max(1000).default(0),
  notes: text(z.string().max(2000, { message: 'At most 2000 characters' })).default(''),
});
export type SupplierInput = z.input<typeof supplierInputSchema>;
export const supplierPatchSchema = supplierInputSchema.partial();

export type Supplier = {
  id: string;
  name: string;
  email: string;
  currency: string;
  stock: SupplierStockLine[];
  cutFee: number;
  notes: string;
  updatedAt: string;
};

export const supplierParamsSchema = z.object({ supplierId: idSchema });

// ----- orders -----

export const ORDER_STATUSES = ['draft', 'sending', 'sent', 'received'] as const;
export type OrderStatus = (typeof ORDER_STATUSES)[number];
export const orderModeSchema = z.enum(['stock', 'cut-to-length']);
export const paperSchema = z.enum(['A4', 'LETTER']);
export const shopUnitsSchema = z.object({ display: z.enum(['mm', 'in']), frac: z.union([z.literal(16), z.literal(32)]) });

/** Shop-floor settings for one plan: trim cut at the start of each bar and the shortest offcut worth keeping; left
 * out, the frame's own settings apply. */
export const shopSettingsSchema = z.object({
  trim_mm: z.number().min(0, { message: 'Must not be negative' }).max(200, { message: 'At most 200 mm' }).optional(),
  minOffcut_mm: z.number().min(0, { message: 'Must not be negative' }).max(3000, { message: 'At most 3000 mm' }).optional(),
});

export const createOrderSchema = z.object({
  frameId: idSchema,
  supplierId: idSchema,
  mode: orderModeSchema.default('stock'),
  paper: paperSchema.default('A4'),
  useShelf: z.boolean().default(true),
  settings: shopSettingsSchema.prefault({}),
});
export type CreateOrderRequest = z.input<typeof createOrderSchema>;

export const orderStatusPatchSchema = z.object({ status: z.literal('received') });
export const orderParamsSchema = z.object({ orderId: idSchema });

/** What was ordered, frozen when the order was made. */
export type OrderContents = {
  meta: ShopMeta;
  order: OrderList;
  /** The shop's view: the chosen way of buying and the other for comparison. */
  text: string;
  /** What the e-mail to the supplier says: the chosen way only (absent on orders made before it was kept). */
  supplierText?: string;
  supplierName: string;
  supplierEmail: string;
};

export type OrderSummary = {
  id: string;
  reference: string;
  status: OrderStatus;
  mode: 'stock' | 'cut-to-length';
  frame: { id: string; name: string } | null;
  frameVersion: number | null;
  supplier: { id: string; name: string; email: string } | null;
  currency: string;
  stockTotal: number;
  cutToLengthTotal: number;
  barsToBuy: number;
  createdAt: string;
  createdBy: { id: string; name: string } | null;
  sentAt: string | null;
  sentTo: string | null;
  sendError: string | null;
  receivedAt: string | null;
};
export type OrderDetail = OrderSummary & { contents: OrderContents };

/** GET /api/orders/:orderId/order.pdf?copy=: the shop's copy (both ways of buying) or the one the supplier gets. */
export const orderPdfQuerySchema = z.object({
  copy: z.enum(['shop', 'supplier'], { message: "Must be 'shop' or 'supplier'" }).default('shop'),
  /** inline: shown in the page (the preview before sending) rather than downloaded. */
  view: z.enum(['inline', 'download'], { message: "Must be 'inline' or 'download'" }).default('download'),
});

/** GET /api/orders/:orderId/send-preview: the e-mail "Send to supplier" would send, exactly. */
export type SendPreview = { to: string; subject: string; text: string; attachment: { filename: string; url: string } };

// ----- cutting at the saw -----

export type CutSessionPlan = {
  frameName: string;
  cutList: ShopCutList;
  plans: ProfilePlan[];
  /** The parts as they were when cutting started, for the what-changed reuse plan. */
  members: { id: string; mark: string; profile: string; cut_length_mm: number }[];
  settings: { trim_mm: number; minOffcut_mm: number };
  units: ShopUnits;
};

export type CutTickView = { cutKey: string; mark: string; tickedBy: z.infer<typeof userRefSchema> | null; tickedAt: string };

export type CuttingState = {
  frameId: string;
  frameName: string;
  projectName: string;
  currentVersion: number;
  /** What cutting depends on in the design as saved now (see cuttingKey); the banner compares it with the session's. */
  currentCuttingKey: string;
  session: { id: string; frameVersion: number; cuttingKey: string; startedAt: string; startedBy: { id: string; name: string } | null; plan: CutSessionPlan } | null;
  ticks: CutTickView[];
  /** The design changed since cutting started: how the parts already cut are reused in the new design. */
  reuse: WhatChanged | null;
  canTick: boolean;
  canRestart: boolean;
};

export const tickRequestSchema = z.object({ cutKey: text(z.string().min(3).max(200)) });
export const startCuttingSchema = z.object({ settings: shopSettingsSchema.prefault({}), restart: z.boolean().default(false) });
export const frameIdParamsSchema = z.object({ frameId: idSchema });

// ----- shelf stock, custom profiles, imports -----

export type ImportResult = { imported: number; errors: CsvRowError[] };
export type Offcut = { id: string; profile: string; length_mm: number; qty: number; createdAt: string };
export type CustomProfileView = {
  id: string;
  name: string;
  width_mm: number;
  height_mm: number;
  area_mm2: number;
  Ix_mm4: number;
  Iy_mm4: number;
  Wx_mm3: number | null;
  Wy_mm3: number | null;
  mass_kg_per_m: number;
};
export const offcutParamsSchema = z.object({ workshopId: idSchema, offcutId: idSchema });

// ----- attachments -----

export const ATTACHMENT_TYPES = ['image/jpeg', 'image/png', 'image/webp', 'application/pdf'] as const;
export const MAX_ATTACHMENT_BYTES = 10 * 1024 * 1024;
export type AttachmentView = {
  id: string;
  filename: string;
  contentType: string;
  size: number;
  createdAt: string;
  uploadedBy: { id: string; name: string } | null;
  /** Shown to the project's clients and on its share links. */
  sharedWithClient: boolean;
};
export const updateAttachmentRequestSchema = z.object({ sharedWithClient: z.boolean({ message: 'Must be true or false' }) });
export const attachmentParamsSchema = z.object({ attachmentId: idSchema });

// ----- outbox (local test mail server) -----

export type OutboxMail = {
  id: string;
  receivedAt: string;
  from: string;
  to: string;
  subject: string;
  text: string;
  kind: string | null;
  attachments: { filename: string; contentType: string; size: number }[];
};
export type OutboxList = { fake: boolean; host: string; messages: OutboxMail[] };
