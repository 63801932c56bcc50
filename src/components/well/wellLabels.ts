import type { CurveRole, PressureQuality, WellStatus } from '@shared/schemas/wells';

type TagType = 'default' | 'info' | 'success' | 'warning' | 'error';

export { DEMO_TEAM_NAME } from '@/stores/team';

export const WELL_STATUS_LABELS: Record<WellStatus, string> = {
  planned: 'Planned',
  drilling: 'Drilling',
  drilled: 'Drilled',
  abandoned: 'Abandoned',
  suspended: 'Suspended',
};

export const WELL_STATUS_TAGS: Record<WellStatus, TagType> = {
  planned: 'info',
  drilling: 'warning',
  drilled: 'success',
  abandoned: 'default',
  suspended: 'warning',
};

export const PRESSURE_QUALITY_LABELS: Record<PressureQuality, string> = {
  good: 'Good',
  tight: 'Tight',
  supercharged: 'Supercharged',
  doubtful: 'Doubtful',
  unknown: 'Not graded',
};

/** Tight and supercharged tests read high or unstable; a doubtful one should not steer a decision. */
export const PRESSURE_QUALITY_TAGS: Record<PressureQuality, TagType> = {
  good: 'success',
  tight: 'warning',
  supercharged: 'warning',
  doubtful: 'error',
  unknown: 'default',
};

export const CURVE_ROLE_LABELS: Record<CurveRole, string> = {
  sonic: 'Sonic slowness',
  resistivity: 'Resistivity',
  density: 'Bulk density',
  gamma: 'Gamma ray',
  caliper: 'Caliper',
  neutron: 'Neutron',
  porosity: 'Porosity',
  other: 'Other',
};

/** Datum abbreviations spelled out for the facts panel. */
export const DATUM_KIND_LABELS: Record<string, string> = {
  RT: 'Rotary table (RT)',
  KB: 'Kelly bushing (KB)',
  DF: 'Drill floor (DF)',
  GL: 'Ground level (GL)',
  MSL: 'Mean sea level (MSL)',
};
