export * from './bounds';
export * from './job';
export * from './plan';
export * from './shelf';
export type { Fit, NestItem, PackedSheet, RegionNode, SheetKind, Split } from './guillotine';
export { nest } from './guillotine';
export * from './check';
export * from './from-goods';
