import type { Action } from '@shared/auth/permissions';

export type AreaKey = 'map' | 'wells' | 'import' | 'prospects' | 'hazards' | 'exports' | 'team' | 'outbox';

/** A work area of the app: one side-navigation entry, one route, one permission. */
export interface Area {
  key: AreaKey;
  path: string;
  label: string;
  /** One line under the page title saying what the area is for. */
  summary: string;
  action: Action;
  section: 'work' | 'admin';
}

/** Order here is the order in the side navigation. */
export const AREAS: readonly Area[] = [
  {
    key: 'map',
    path: '/map',
    label: 'Atlas',
    summary: 'The shared map of wells, prospects and hazard notes for this team.',
    action: 'team.read',
    section: 'work',
  },
  {
    key: 'wells',
    path: '/wells',
    label: 'Offset wells',
    summary: 'Drilled wells, their logs and the pore-pressure interpretations made from them.',
    action: 'team.read',
    section: 'work',
  },
  {
    key: 'import',
    path: '/import',
    label: 'Import',
    summary: 'Bring well headers, surveys, pressures, formation tops and LAS logs into this team, checked line by line first.',
    action: 'wells.import',
    section: 'work',
  },
  {
    key: 'prospects',
    path: '/prospects',
    label: 'Prospects',
    summary: 'Prospects and planned wells, with the offsets chosen to predict their pressures.',
    action: 'team.read',
    section: 'work',
  },
  {
    key: 'hazards',
    path: '/hazards',
    label: 'Hazard notes',
    summary: 'Drilling events and warnings pinned to places and depths.',
    action: 'team.read',
    section: 'work',
  },
  {
    key: 'exports',
    path: '/exports',
    label: 'Profile exports',
    summary: 'Pressure profiles of a planned well, packaged for the drilling programme.',
    action: 'exports.create',
    section: 'work',
  },
  {
    key: 'team',
    path: '/team',
    label: 'Team & access',
    summary: 'Who is in this team, their roles, and invitations.',
    action: 'members.manage',
    section: 'admin',
  },
  {
    key: 'outbox',
    path: '/outbox',
    label: 'Mail outbox',
    summary: 'Invitations this team sent, as the local mail fake received them (password-reset mail is never shown here).',
    action: 'outbox.read',
    section: 'admin',
  },
];

/**
 * The area for a key; throws on an unknown key so a typo in a route fails at start-up.
 * @example areaByKey('wells').label // 'Offset wells'
 */
export function areaByKey(key: AreaKey): Area {
  const area = AREAS.find((a) => a.key === key);
  if (!area) throw new Error(`Unknown area: ${key}`);
  return area;
}

/**
 * Areas the user may open, given a permission check for the current team.
 * @example visibleAreas((a) => a === 'team.read').map((a) => a.key) // ['map', 'wells', 'prospects', 'hazards']
 */
export function visibleAreas(allowed: (action: Action) => boolean): Area[] {
  return AREAS.filter((a) => allowed(a.action));
}
