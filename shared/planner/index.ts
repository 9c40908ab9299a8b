export { planCuts, planCutsSync, useMipSolver, DEFAULT_TIME_LIMIT_MS, type PlanOptions, type PlanProgress, type PlanPhase } from './plan-cuts';
export { cutJobSchema, validateCutJob, type CutJob, type ValidCutJob, type StockInput, type PartInput } from './job';
export type { CutPlan, PlannedBar, PlannedCut } from './plan';
export { orderList, type OrderList, type OrderLine, type CutToLengthLine } from './order-list';
export type { MipSolver, MipResult } from './core/exact';
