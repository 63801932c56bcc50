/**
 * Isaaks & Srivastava (1989), An Introduction to Applied Geostatistics, ch. 12: seven V samples (ppm) around the
 * point (65E, 137N), covariance C(h) = 10·e^(−0.3h). (values recalled from memory)
 */
export const ISAAKS_SRIVASTAVA_POINTS = [
  { x: 61, y: 139, value: 477 },
  { x: 63, y: 140, value: 696 },
  { x: 64, y: 129, value: 227 },
  { x: 68, y: 128, value: 646 },
  { x: 71, y: 140, value: 606 },
  { x: 73, y: 141, value: 791 },
  { x: 75, y: 128, value: 783 },
];
export const ISAAKS_SRIVASTAVA_TARGET = { x: 65, y: 137 };
/** C(h) = 10·e^(−0.3h) is the exponential model with sill 10 and practical range 10 (GSLIB: e^(−3h/a)). */
export const ISAAKS_SRIVASTAVA_VARIOGRAM = { model: 'exponential' as const, nugget: 0, sill: 10, range: 10 };
