/** LAS 2.0 well logs: read, check, write (CWLS "LAS Version 2.0: A Digital Standard for Logs"). */
export { parseLas } from './parseLas';
export { writeLas, type LasWriteInput, type LasWriteCurve } from './writeLas';
export { suggestCurveRole, type CurveRole } from './curveRole';
export { normaliseDepthUnit, depthsInMetres, METRES_PER_FOOT } from './depthUnit';
export { parseHeaderLine } from './headerLine';
export { formatLasNumber } from './formatLasNumber';
export { DEFAULT_LAS_NULL } from './wellInfo';
export { LAS3_MESSAGE } from './versionInfo';
export { MAX_LINE_LENGTH } from './lasLines';
export type { LasFile, LasCurve, LasIndex, LasWellInfo, HeaderItem, DepthUnit } from './types';
export { readLasLocation, parseDegrees, type LasWellLocation, type LasCoordinate } from './wellLocation';
