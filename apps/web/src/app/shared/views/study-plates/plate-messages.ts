import type { MetalTint, SurfaceLight, SurfaceWindow } from '@barwright/engine';

/** Page → plate worker. */
export type PlateRequest =
  /** The canvas this worker paints, handed over once (OffscreenCanvas): the flat plate's or the lit one's. */
  | { kind: 'canvas'; plate: 'flat' | 'lit'; canvas: OffscreenCanvas }
  /**
   * A new study or window: its grooves (x, y pairs, mm), the window and its size in device pixels, and
   * the flat plate's ink, ground and least stroke (device px). The flat worker draws its plate, the lit one computes its surface.
   */
  | {
      kind: 'surface';
      id: number;
      lines: Float64Array[];
      width: number;
      depth: number;
      vAngle: number;
      window: SurfaceWindow;
      widthPx: number;
      heightPx: number;
      ink: string;
      ground: string;
      hairlinePx: number;
    }
  /** A new light or metal (to the lit worker): reshades the surface held, without computing it again. */
  | { kind: 'light'; light: SurfaceLight; tint: MetalTint };

/**
 * Plate worker → page: request `id` is on the canvas named (a reshade names the study its surface is of);
 * `fine` false: the lit plate's quick surface, its anti-aliased one to follow; `fieldMs` is 0 for a reshade.
 */
export interface PlateReply {
  id: number;
  plate: 'flat' | 'lit';
  fine: boolean;
  fieldMs: number;
  paintMs: number;
}
