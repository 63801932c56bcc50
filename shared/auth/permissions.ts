/**
 * One permission table for the server (route guards) and the UI (what to show).
 * A role is held per team; a user with no membership in a team can do nothing there.
 */
export const ROLES = ['admin', 'geoscientist', 'planner', 'viewer'] as const;
export type Role = (typeof ROLES)[number];

export const ACTIONS = [
  'team.read', // see the team's wells, maps, interpretations, surfaces
  'comment.write',
  'wells.import',
  'wells.edit',
  'interpretations.edit',
  'surfaces.run',
  'hazards.edit',
  'prospects.edit',
  'plannedWells.edit',
  'offsets.edit',
  'exports.create',
  'layers.upload',
  'members.manage',
  'outbox.read',
] as const;
export type Action = (typeof ACTIONS)[number];

const GRANTS: Record<Role, readonly Action[] | 'all'> = {
  admin: 'all',
  geoscientist: [
    'team.read',
    'comment.write',
    'wells.import',
    'wells.edit',
    'interpretations.edit',
    'surfaces.run',
    'hazards.edit',
    'layers.upload',
  ],
  planner: ['team.read', 'comment.write', 'prospects.edit', 'plannedWells.edit', 'offsets.edit', 'exports.create', 'hazards.edit'],
  viewer: ['team.read', 'comment.write'],
};

/** The minimal shape both sides know about a user: their role in each team. */
export interface MembershipLike {
  teamId: string;
  role: Role;
}

/** Whether `role` may perform `action`. */
export function roleCan(role: Role, action: Action): boolean {
  const grants = GRANTS[role];
  return grants === 'all' || grants.includes(action);
}

/**
 * Whether a user with these memberships may perform `action` in team `teamId`.
 * @example can([{ teamId: 't1', role: 'viewer' }], 'wells.import', 't1') // false
 */
export function can(memberships: readonly MembershipLike[], action: Action, teamId: string): boolean {
  const m = memberships.find((x) => x.teamId === teamId);
  return m !== undefined && roleCan(m.role, action);
}

/** All actions a role holds, for display in team administration. */
export function actionsOf(role: Role): Action[] {
  return ACTIONS.filter((a) => roleCan(role, a));
}
