export * from './bay-panels';
export * from './countertop';
export * from './drawer-box';
export * from './drawer-faces';
export * from './materials';
export * from './parts';
export * from './slides';
