// Minimal typings for the parts of clipper-lib 6.4.2 (CommonJS) that the boolean module uses.
declare module 'clipper-lib' {
  export interface IntPoint {
    X: number;
    Y: number;
    Z?: number;
  }
  export type Path = IntPoint[];
  export type Paths = Path[];
  export class Clipper {
    constructor(initOptions?: number);
    PreserveCollinear: boolean;
    StrictlySimple: boolean;
    ZFillFunction: ((e1bot: IntPoint, e1top: IntPoint, e2bot: IntPoint, e2top: IntPoint, pt: IntPoint) => void) | null;
    AddPath(path: Path, polyType: number, closed: boolean): boolean;
    AddPaths(paths: Paths, polyType: number, closed: boolean): boolean;
    Execute(clipType: number, solution: Paths, subjFillType: number, clipFillType: number): boolean;
    static Area(path: Path): number;
  }
  const ClipperLib: {
    use_xyz: boolean;
    use_lines: boolean;
    Clipper: typeof Clipper;
    ClipType: { ctIntersection: number; ctUnion: number; ctDifference: number; ctXor: number };
    PolyType: { ptSubject: number; ptClip: number };
    PolyFillType: { pftEvenOdd: number; pftNonZero: number; pftPositive: number; pftNegative: number };
  };
  export default ClipperLib;
}
