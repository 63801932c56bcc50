import { Router } from 'express';
import { z } from 'zod';
import { can, type Action } from '../../../shared/auth/permissions';
import type { Job, JobKind } from '../../../shared/schemas/jobs';
import { forbidden, notFound } from '../../lib/httpError';
import type { JobRegistry } from '../../lib/jobs';
import { parse } from '../../lib/parse';
import { requireTeam, teamIdOf } from '../../middleware/guards';

/** Who may follow a job: the people who may start that kind of work, or (surfaces) see its result. */
const JOB_READ_PERMISSION = { import: 'wells.import', surface: 'team.read' } as const satisfies Record<JobKind, Action>;

const jobParams = z.object({ jobId: z.string().min(1) });

/** The one poll route of every background job (imports, surface runs). */
export function jobsRouter(jobs: JobRegistry): Router {
  const r = Router({ mergeParams: true });
  r.get('/:teamId/jobs/:jobId', requireTeam('team.read'), (req, res) => {
    const teamId = teamIdOf(req);
    const job = jobs.get(teamId, parse(jobParams, req.params).jobId);
    if (!job) throw notFound('That job');
    if (!can(req.session!.memberships, JOB_READ_PERMISSION[job.kind], teamId)) throw forbidden();
    res.json(job satisfies Job);
  });
  return r;
}
