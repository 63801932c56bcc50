/** A measured value at a location in a projected metric frame (x east, y north, metres). */
export interface DataPoint {
  x: number;
  y: number;
  value: number;
}

/** A location to estimate at, same frame as the data. */
export interface Target {
  x: number;
  y: number;
}

export type VariogramModel = 'spherical' | 'exponential' | 'gaussian';

/**
 * A fitted variogram, GSLIB convention: `range` is the practical range (the model reaches 95 % of the sill there
 * for exponential and gaussian, the full sill for spherical); `sill` is the partial sill, total sill = nugget + sill.
 */
export interface Variogram {
  model: VariogramModel;
  nugget: number;
  sill: number;
  range: number;
}

/** One bin of an experimental variogram. */
export interface VariogramLag {
  /** Mean separation of the pairs in the bin, m. */
  lagM: number;
  /** Semivariance ½·mean((zi − zj)²). */
  gamma: number;
  pairs: number;
}
