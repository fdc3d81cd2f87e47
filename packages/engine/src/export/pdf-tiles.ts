/** Paper sizes, landscape, in PDF points (1 pt = 1/72 in). A4 is 297 × 210 mm (ISO 216); Letter 11 × 8.5 in. */
export const PAPER_POINTS = {
  a4: [841.8898, 595.2756],
  letter: [792, 612],
} as const satisfies Record<string, readonly [number, number]>;
export type Paper = keyof typeof PAPER_POINTS;

/** Points per millimetre: 72 pt per inch, 25.4 mm per inch. */
export const PT_PER_MM = 72 / 25.4;
/** Page margin, mm: inside the unprintable border of common printers. */
export const PAGE_MARGIN_MM = 12;
/** Tiles overlap by this much so they can be trimmed and butted or lapped, mm. */
export const TILE_OVERLAP_MM = 10;

/** One tile: the x range of the bar it shows, mm. */
export interface Tile {
  index: number;
  xFrom: number;
  xTo: number;
}

/**
 * Splits a bar of `length` mm into tiles at most `usable` mm wide, neighbours overlapping by
 * `overlap` mm. One tile when the bar fits.
 */
export function tileRanges(length: number, usable: number, overlap = TILE_OVERLAP_MM): Tile[] {
  if (length <= usable) return [{ index: 0, xFrom: 0, xTo: length }];
  const stride = usable - overlap;
  const count = Math.ceil((length - overlap) / stride);
  return Array.from({ length: count }, (_, index) => {
    const xFrom = index * stride;
    return { index, xFrom, xTo: Math.min(length, xFrom + usable) };
  });
}
