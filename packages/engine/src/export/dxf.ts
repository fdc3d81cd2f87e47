import { MM_PER_INCH, type Units } from '@barwright/contracts';
import type { Point } from '../types';
import type { BarDrawing } from './bar-drawing';
import { fixed } from './number-format';

/** $INSUNITS codes of the DXF header: 1 inches, 4 millimetres. */
const INSUNITS: Readonly<Record<Units, number>> = { in: 1, mm: 4 };
const DECIMALS: Readonly<Record<Units, number>> = { mm: 5, in: 6 };

/**
 * The bar as an ASCII DXF, release 12 (AC1009), in the design's units: layers OUTLINE (closed
 * polyline: the cut edge over a band of bar body), CUTTER_PATH and BLANK_EDGE (a LINE).
 */
export function barDxf(drawing: BarDrawing, units: Units): string {
  const scale = units === 'in' ? 1 / MM_PER_INCH : 1;
  const num = (mm: number) => fixed(mm * scale, DECIMALS[units]);
  const out: string[] = [];
  const pair = (code: number, value: string | number) => out.push(String(code), String(value));

  pair(0, 'SECTION');
  pair(2, 'HEADER');
  pair(9, '$ACADVER');
  pair(1, 'AC1009');
  pair(9, '$INSUNITS');
  pair(70, INSUNITS[units]);
  pair(9, '$MEASUREMENT');
  pair(70, units === 'mm' ? 1 : 0);
  pair(9, '$EXTMIN');
  pair(10, num(0));
  pair(20, num(drawing.backY));
  pair(9, '$EXTMAX');
  pair(10, num(drawing.length));
  pair(20, num(drawing.topY));
  pair(0, 'ENDSEC');

  pair(0, 'SECTION');
  pair(2, 'ENTITIES');
  polyline(pair, num, 'OUTLINE', drawing.outline, true);
  polyline(pair, num, 'CUTTER_PATH', drawing.cutterPath, false);
  pair(0, 'LINE');
  pair(8, 'BLANK_EDGE');
  pair(10, num(0));
  pair(20, num(drawing.blankEdgeY));
  pair(30, num(0));
  pair(11, num(drawing.length));
  pair(21, num(drawing.blankEdgeY));
  pair(31, num(0));
  pair(0, 'ENDSEC');
  pair(0, 'EOF');
  return out.join('\r\n') + '\r\n';
}

type Pair = (code: number, value: string | number) => void;

/** A 2D POLYLINE with its VERTEX entities and SEQEND (R12). */
function polyline(pair: Pair, num: (mm: number) => string, layer: string, points: readonly Point[], closed: boolean): void {
  pair(0, 'POLYLINE');
  pair(8, layer);
  pair(66, 1);
  pair(10, num(0));
  pair(20, num(0));
  pair(30, num(0));
  pair(70, closed ? 1 : 0);
  for (const [x, y] of points) {
    pair(0, 'VERTEX');
    pair(8, layer);
    pair(10, num(x));
    pair(20, num(y));
    pair(30, num(0));
  }
  pair(0, 'SEQEND');
  pair(8, layer);
}
