// Types for the parts of clipper-lib (npm, a port of the Clipper polygon library; no bundled types) that the envelope checks use.
declare module 'clipper-lib' {
  export interface IntPoint {
    X: number;
    Y: number;
  }
  export type Path = IntPoint[];
  export class ClipperOffset {
    constructor(miterLimit?: number, arcTolerance?: number);
    AddPath(path: Path, joinType: number, endType: number): void;
    AddPaths(paths: Path[], joinType: number, endType: number): void;
    Execute(solution: Path[], delta: number): void;
  }
  export const JoinType: { jtSquare: number; jtRound: number; jtMiter: number };
  export const EndType: { etClosedPolygon: number; etClosedLine: number; etOpenButt: number; etOpenSquare: number; etOpenRound: number };
  const ClipperLib: { ClipperOffset: typeof ClipperOffset; JoinType: typeof JoinType; EndType: typeof EndType };
  export default ClipperLib;
}
