import type { Action, Role } from '@shared/auth/permissions';

/** How roles read in the interface (shared with the server, which names roles in mail). */
export { ROLE_LABELS } from '@shared/auth/roleLabels';

/** One line per role for the invite form and the members table. */
export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  admin: 'Everything, including members, invitations and the mail outbox.',
  geoscientist: 'Imports wells, interprets pressures, runs surfaces and uploads layers.',
  planner: 'Plans prospects and wells, picks offsets and creates profile exports.',
  viewer: 'Reads everything in the team and comments.',
};

/** What an action lets someone do, phrased to finish "Your role does not allow you to …". */
export const ACTION_PHRASES: Record<Action, string> = {
  'team.read': "see this team's work",
  'comment.write': 'write comments',
  'wells.import': 'import wells',
  'wells.edit': 'edit wells',
  'interpretations.edit': 'edit pressure interpretations',
  'surfaces.run': 'run surfaces',
  'hazards.edit': 'edit hazard notes',
  'prospects.edit': 'edit prospects',
  'plannedWells.edit': 'edit planned wells',
  'offsets.edit': 'choose offset wells',
  'exports.create': 'create profile exports',
  'layers.upload': 'upload map layers',
  'members.manage': 'manage members and invitations',
  'outbox.read': 'read the mail outbox',
};
