/** Net section along a line, and the exact boundary queries it shares with the cautions. */
export { netSection, describeGap, NetSectionError, NET_SECTION_PURPOSE, NET_SECTION_CAUTION, type NetSection, type NetGap, type GapKind } from './net-section';
export { regionBoundary, windingAt, distanceToBoundary, loopCircle, POINT_TOL, type Boundary, type BoundaryLoop, type BoundarySegment, type CircleFit } from './boundary';
export { lineBreakpoints, classifyPieces, type Breakpoint, type Piece } from './line-crossings';
