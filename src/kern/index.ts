/** The section kern: the exact convex hull of a line-and-arc region and the kern traced from it. */
export { convexHull } from './hull';
export { kernFromHull, sectionKern, polygonAreaPerimeter, type KernPoint, type KernSection } from './kern';
