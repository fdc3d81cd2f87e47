import { closePath, lineTo, moveTo, type PDFOperator, type PDFPage } from 'pdf-lib';
import type { Point } from '../types';

/** Operators per pushOperators call: pdf-lib spreads them into one push, which overflows the stack on a long path. */
const OPERATOR_BATCH = 10_000;

/** Pushes groups of operators in batches a call's argument list can hold. */
export function pushAll(page: PDFPage, ...groups: readonly PDFOperator[][]): void {
  for (const ops of groups) for (let i = 0; i < ops.length; i += OPERATOR_BATCH) page.pushOperators(...ops.slice(i, i + OPERATOR_BATCH));
}

/** A polyline (or closed polygon) as path operators, points already in page points. */
export function path(points: readonly Point[], closed: boolean): PDFOperator[] {
  const ops = points.map(([x, y], i) => (i === 0 ? moveTo(x, y) : lineTo(x, y)));
  if (closed) ops.push(closePath());
  return ops;
}
