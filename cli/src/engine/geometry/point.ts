/**
 * A point in a plane: the plate's (x along the load, y across it, member units) in the engine, the
 * sheet's (paper mm, y down) in the drawing model. The one point type of the package.
 */
export type Point = readonly [x: number, y: number];
