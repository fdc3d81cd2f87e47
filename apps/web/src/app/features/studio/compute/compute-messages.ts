import type { Design } from '@barwright/contracts';
import type { DesignViews } from './design-views';

/** Page → worker: compute the views of this design (the newest request replaces any waiting one). */
export interface ComputeRequest {
  id: number;
  design: Design;
}

/** Worker → page: one stage of the views of request `id`, or the engine's error. */
export type ComputeReply = { id: number; views: DesignViews } | { id: number; error: string };
