import type { JobPhase } from '@shared/schemas/jobs';

/** What each phase of a server job is called on screen: one table, keyed by the shared phase enum. */
export const JOB_PHASE_LABELS: Record<JobPhase, string> = {
  starting: 'Starting',
  'reading file': 'Reading the file',
  'checking rows': 'Checking rows',
  'writing new wells': 'Writing new wells',
  'updating wells': 'Updating wells',
  'writing survey stations': 'Writing survey stations',
  'writing pressure observations': 'Writing pressure observations',
  'writing formation tops': 'Writing formation tops',
  'writing log curves': 'Writing log curves',
  'gathering wells': 'Gathering wells',
  'building well profiles': 'Building well profiles',
  interpolating: 'Interpolating the grid',
  'cross-validating': 'Cross-validating',
  contouring: 'Drawing contours',
  saving: 'Saving',
  finished: 'Finished',
  failed: 'Failed',
};
