import type { MetalTint, SurfaceLight, SurfaceWindow } from '@barwright/engine';

/** Page → lit worker. */
export type LitRequest =
  /** The canvas to paint, handed over once (OffscreenCanvas). */
  | { kind: 'canvas'; canvas: OffscreenCanvas }
  /** A new surface: its grooves (x, y pairs, mm), window and size in device pixels. Computes the height field. */
  | { kind: 'surface'; id: number; lines: Float64Array[]; depth: number; vAngle: number; window: SurfaceWindow; width: number; height: number }
  /** A new light or metal: reshades the surface held, without computing it again. */
  | { kind: 'light'; id: number; light: SurfaceLight; tint: MetalTint };

/** Lit worker → page: request `id` is on the canvas; `fieldMs` is 0 for a reshade. */
export interface LitReply {
  id: number;
  fieldMs: number;
  shadeMs: number;
}
