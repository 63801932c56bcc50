export type { StationInput, TieIn, SurveyStation, Survey, Position, PositionArrays } from './types';
export { computeSurvey, minimumCurvature } from './minimumCurvature';
export { positionAt, tvdAt } from './positionAt';
export type { SurveySource } from './positionAt';
