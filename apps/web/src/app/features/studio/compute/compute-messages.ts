import type { Design } from '@barwright/contracts';
import type { Companion } from '@barwright/engine';
import type { DesignViews } from './design-views';

/** Page → worker: compute the views of this design (the newest request replaces any waiting one). */
export interface ComputeRequest {
  id: number;
  design: Design;
  /** A companion bar to compute beside the shown one, for the bar view. */
  companion?: Companion;
}

/** Worker → page: one stage of the views of request `id`, or the engine's error. */
export type ComputeReply = { id: number; views: DesignViews } | { id: number; error: string };
