import type { Design } from '@barwright/contracts';
import type { Companion } from '@barwright/engine';
import type { ProfileMode } from '../../../shared/views/profile-drawing';
import type { DesignViews, StudyLead } from './design-views';

/** Page → worker: compute the views of this design (the newest request replaces any waiting one). */
export interface ComputeRequest {
  id: number;
  design: Design;
  /** A companion bar to compute beside the shown one, for the bar view. */
  companion?: Companion;
  /** The bar view's mode, the one its drawing is made in (detail when not said). */
  mode?: ProfileMode;
  /**
   * The design is about to be edited (the studio): once its views are sent, the worker computes it a
   * few times more while idle, so that V8 has compiled the engine before the first edit (WARM_UP_RUNS).
   */
  warmUp?: boolean;
}

/**
 * Page → worker: the buffers of views the page no longer shows, for the worker to write the next
 * computation's arrays over (ArrayPool).
 */
export interface RecycleMessage {
  recycle: ArrayBuffer[];
}

export type ComputeMessage = ComputeRequest | RecycleMessage;

/**
 * Worker → page, for each stage of request `id`: first the line study alone (`lead`), as soon as it is
 * computed, so the plates start on it while the worker finishes the bar's drawings and the plan; then
 * the rest of the views (`views`, without the study the lead carried); or the engine's error.
 */
export type ComputeReply =
  | { id: number; lead: StudyLead }
  | { id: number; views: Omit<DesignViews, 'study'> }
  | { id: number; error: string };
