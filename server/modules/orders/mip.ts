// HiGHS for the stock planner's exact model (small jobs on several bar lengths), loaded once per process; the
// planner itself does no I/O, so the server hands it the solver. Without it (load failure) plans come from the search.
import highsLoader from 'highs';
import { useMipSolver, type MipSolver } from '@shared/planner';

let loading: Promise<void> | null = null;

export function ensureMipSolver(): Promise<void> {
  loading ??= highsLoader()
    .then((highs) => useMipSolver(highs.solve as unknown as MipSolver))
    .catch((err: unknown) => console.warn(`stock planner: HiGHS not loaded (${err instanceof Error ? err.message : String(err)}); planning by search alone`));
  return loading;
}
